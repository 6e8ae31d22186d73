ALTER TABLE `users` MODIFY `email` varchar(255) CHARACTER SET utf8mb4 COLLATE utf8mb4_bin NOT NULL;--> statement-breakpoint
ALTER TABLE `verification_tokens` MODIFY `identifier` varchar(255) CHARACTER SET utf8mb4 COLLATE utf8mb4_bin NOT NULL;--> statement-breakpoint
DELETE FROM `sessions`;--> statement-breakpoint
ALTER TABLE `sessions` ADD `last_seen_at` datetime(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(3);--> statement-breakpoint
ALTER TABLE `sessions` ADD `user_agent` varchar(255) NOT NULL DEFAULT '';--> statement-breakpoint
CREATE INDEX `sessions_user` ON `sessions` (`userId`);--> statement-breakpoint
CREATE TABLE `sign_in_counters` (
	`key_hash` varchar(80) NOT NULL,
	`window_start` datetime(3) NOT NULL,
	`n` int NOT NULL DEFAULT 0,
	CONSTRAINT `sign_in_counters_key_hash_window_start_pk` PRIMARY KEY(`key_hash`,`window_start`)
);
