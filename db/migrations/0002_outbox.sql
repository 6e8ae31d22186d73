CREATE TABLE `outbox` (
	`id` bigint unsigned AUTO_INCREMENT NOT NULL,
	`dedupe_key` varchar(191) NOT NULL,
	`to_email` varchar(255) NOT NULL,
	`subject` varchar(255) NOT NULL,
	`body_text` text NOT NULL,
	`status` enum('pending','sending','sent','failed') NOT NULL DEFAULT 'pending',
	`attempts` int NOT NULL DEFAULT 0,
	`next_attempt_at` datetime(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(3),
	`last_error` varchar(500),
	`sent_at` datetime(3),
	`created_at` datetime(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(3),
	CONSTRAINT `outbox_id` PRIMARY KEY(`id`),
	CONSTRAINT `outbox_dedupe` UNIQUE(`dedupe_key`)
);
--> statement-breakpoint
CREATE INDEX `outbox_due` ON `outbox` (`status`,`next_attempt_at`);