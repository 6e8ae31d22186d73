CREATE TABLE `digest_items` (
	`id` bigint unsigned AUTO_INCREMENT NOT NULL,
	`user_id` varchar(255) NOT NULL,
	`commission_id` bigint unsigned NOT NULL,
	`line` varchar(500) NOT NULL,
	`link` varchar(500) NOT NULL,
	`dedupe_key` varchar(191) NOT NULL,
	`created_at` datetime(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(3),
	`digested_at` datetime(3),
	CONSTRAINT `digest_items_id` PRIMARY KEY(`id`),
	CONSTRAINT `digest_items_dedupe` UNIQUE(`dedupe_key`)
);
--> statement-breakpoint
ALTER TABLE `digest_items` ADD CONSTRAINT `digest_items_user_id_users_id_fk` FOREIGN KEY (`user_id`) REFERENCES `users`(`id`) ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `digest_items` ADD CONSTRAINT `digest_items_commission_id_commissions_id_fk` FOREIGN KEY (`commission_id`) REFERENCES `commissions`(`id`) ON DELETE no action ON UPDATE no action;--> statement-breakpoint
CREATE INDEX `digest_items_user` ON `digest_items` (`user_id`,`digested_at`);