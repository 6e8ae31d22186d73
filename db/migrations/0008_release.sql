CREATE TABLE `permission_plans` (
	`id` bigint unsigned AUTO_INCREMENT NOT NULL,
	`commission_id` bigint unsigned NOT NULL,
	`none_required` boolean NOT NULL DEFAULT false,
	`reason` varchar(1000) NOT NULL DEFAULT '',
	`set_by` varchar(255) NOT NULL,
	`set_at` datetime(3) NOT NULL,
	CONSTRAINT `permission_plans_id` PRIMARY KEY(`id`),
	CONSTRAINT `permission_plans_commission` UNIQUE(`commission_id`)
);
--> statement-breakpoint
CREATE TABLE `required_permissions` (
	`id` bigint unsigned AUTO_INCREMENT NOT NULL,
	`commission_id` bigint unsigned NOT NULL,
	`name` varchar(200) NOT NULL,
	`authority` varchar(200) NOT NULL DEFAULT '',
	`reference` varchar(200),
	`granted_on` varchar(10),
	`conditions` text,
	`document_key` varchar(200),
	`document_name` varchar(255),
	`document_mime` varchar(50),
	`document_sha256` varchar(64),
	`document_size` int unsigned,
	`recorded_by` varchar(255),
	`recorded_at` datetime(3),
	`created_at` datetime(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(3),
	CONSTRAINT `required_permissions_id` PRIMARY KEY(`id`)
);
--> statement-breakpoint
CREATE TABLE `condition_answers` (
	`id` bigint unsigned AUTO_INCREMENT NOT NULL,
	`decision_id` bigint unsigned NOT NULL,
	`commission_id` bigint unsigned NOT NULL,
	`condition_index` int unsigned NOT NULL,
	`answer` text NOT NULL,
	`answered_by` varchar(255) NOT NULL,
	`answered_at` datetime(3) NOT NULL,
	CONSTRAINT `condition_answers_id` PRIMARY KEY(`id`),
	CONSTRAINT `condition_answers_decision_index` UNIQUE(`decision_id`,`condition_index`)
);
--> statement-breakpoint
CREATE TABLE `deposits` (
	`id` bigint unsigned AUTO_INCREMENT NOT NULL,
	`commission_id` bigint unsigned NOT NULL,
	`currency` varchar(3) NOT NULL,
	`contract_sum` bigint unsigned NOT NULL,
	`deposit_basis` enum('percent','amount') NOT NULL,
	`deposit_percent` int unsigned,
	`deposit_amount` bigint unsigned NOT NULL,
	`balance_amount` bigint unsigned NOT NULL,
	`set_by` varchar(255) NOT NULL,
	`set_at` datetime(3) NOT NULL,
	`waived_reason` varchar(1000),
	`waived_by` varchar(255),
	`waived_at` datetime(3),
	`paid_at` datetime(3),
	CONSTRAINT `deposits_id` PRIMARY KEY(`id`),
	CONSTRAINT `deposits_commission` UNIQUE(`commission_id`)
);
--> statement-breakpoint
CREATE TABLE `releases` (
	`id` bigint unsigned AUTO_INCREMENT NOT NULL,
	`commission_id` bigint unsigned NOT NULL,
	`revision_id` bigint unsigned NOT NULL,
	`decision_id` bigint unsigned NOT NULL,
	`content_hash` varchar(64) NOT NULL,
	`frozen` longtext NOT NULL,
	`released_by` varchar(255) NOT NULL,
	`released_at` datetime(3) NOT NULL,
	CONSTRAINT `releases_id` PRIMARY KEY(`id`),
	CONSTRAINT `releases_commission` UNIQUE(`commission_id`)
);
--> statement-breakpoint
ALTER TABLE `permission_plans` ADD CONSTRAINT `permission_plans_commission_id_commissions_id_fk` FOREIGN KEY (`commission_id`) REFERENCES `commissions`(`id`) ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `permission_plans` ADD CONSTRAINT `permission_plans_set_by_users_id_fk` FOREIGN KEY (`set_by`) REFERENCES `users`(`id`) ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `required_permissions` ADD CONSTRAINT `required_permissions_commission_id_commissions_id_fk` FOREIGN KEY (`commission_id`) REFERENCES `commissions`(`id`) ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `required_permissions` ADD CONSTRAINT `required_permissions_recorded_by_users_id_fk` FOREIGN KEY (`recorded_by`) REFERENCES `users`(`id`) ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `condition_answers` ADD CONSTRAINT `condition_answers_decision_id_decisions_id_fk` FOREIGN KEY (`decision_id`) REFERENCES `decisions`(`id`) ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `condition_answers` ADD CONSTRAINT `condition_answers_commission_id_commissions_id_fk` FOREIGN KEY (`commission_id`) REFERENCES `commissions`(`id`) ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `condition_answers` ADD CONSTRAINT `condition_answers_answered_by_users_id_fk` FOREIGN KEY (`answered_by`) REFERENCES `users`(`id`) ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `deposits` ADD CONSTRAINT `deposits_commission_id_commissions_id_fk` FOREIGN KEY (`commission_id`) REFERENCES `commissions`(`id`) ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `deposits` ADD CONSTRAINT `deposits_set_by_users_id_fk` FOREIGN KEY (`set_by`) REFERENCES `users`(`id`) ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `deposits` ADD CONSTRAINT `deposits_waived_by_users_id_fk` FOREIGN KEY (`waived_by`) REFERENCES `users`(`id`) ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `releases` ADD CONSTRAINT `releases_commission_id_commissions_id_fk` FOREIGN KEY (`commission_id`) REFERENCES `commissions`(`id`) ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `releases` ADD CONSTRAINT `releases_revision_id_revisions_id_fk` FOREIGN KEY (`revision_id`) REFERENCES `revisions`(`id`) ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `releases` ADD CONSTRAINT `releases_decision_id_decisions_id_fk` FOREIGN KEY (`decision_id`) REFERENCES `decisions`(`id`) ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `releases` ADD CONSTRAINT `releases_released_by_users_id_fk` FOREIGN KEY (`released_by`) REFERENCES `users`(`id`) ON DELETE no action ON UPDATE no action;--> statement-breakpoint
CREATE INDEX `required_permissions_commission` ON `required_permissions` (`commission_id`);
