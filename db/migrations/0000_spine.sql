CREATE TABLE `accounts` (
	`userId` varchar(255) NOT NULL,
	`type` varchar(255) NOT NULL,
	`provider` varchar(255) NOT NULL,
	`providerAccountId` varchar(255) NOT NULL,
	`refresh_token` varchar(255),
	`access_token` varchar(255),
	`expires_at` int,
	`token_type` varchar(255),
	`scope` varchar(255),
	`id_token` varchar(2048),
	`session_state` varchar(255),
	CONSTRAINT `accounts_provider_providerAccountId_pk` PRIMARY KEY(`provider`,`providerAccountId`)
);
--> statement-breakpoint
CREATE TABLE `commission_members` (
	`id` bigint unsigned AUTO_INCREMENT NOT NULL,
	`commission_id` bigint unsigned NOT NULL,
	`user_id` varchar(255) NOT NULL,
	`role` enum('chair','member','adviser') NOT NULL,
	`treasurer` boolean NOT NULL DEFAULT false,
	`invited_by` varchar(255),
	`created_at` datetime(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(3),
	CONSTRAINT `commission_members_id` PRIMARY KEY(`id`),
	CONSTRAINT `commission_members_commission_user` UNIQUE(`commission_id`,`user_id`)
);
--> statement-breakpoint
CREATE TABLE `commissions` (
	`id` bigint unsigned AUTO_INCREMENT NOT NULL,
	`studio_id` bigint unsigned NOT NULL,
	`title` varchar(200) NOT NULL,
	`client_body` varchar(200) NOT NULL,
	`site` varchar(300) NOT NULL,
	`kind` enum('font') NOT NULL DEFAULT 'font',
	`stage` enum('brief','concept','design-development','approved','in-fabrication','installed','handed-over','on-hold','withdrawn') NOT NULL DEFAULT 'brief',
	`quorum` varchar(20) NOT NULL DEFAULT 'majority',
	`threshold` enum('majority','two-thirds','unanimous') NOT NULL DEFAULT 'majority',
	`chair_votes` boolean NOT NULL DEFAULT false,
	`electronic_authority` varchar(500),
	`created_at` datetime(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(3),
	`updated_at` datetime(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(3),
	CONSTRAINT `commissions_id` PRIMARY KEY(`id`)
);
--> statement-breakpoint
CREATE TABLE `security_log` (
	`id` bigint unsigned AUTO_INCREMENT NOT NULL,
	`user_id` varchar(255),
	`email` varchar(255),
	`at` datetime(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(3),
	`action` varchar(60) NOT NULL,
	`detail` longtext NOT NULL,
	CONSTRAINT `security_log_id` PRIMARY KEY(`id`)
);
--> statement-breakpoint
CREATE TABLE `sessions` (
	`sessionToken` varchar(255) NOT NULL,
	`userId` varchar(255) NOT NULL,
	`expires` timestamp NOT NULL,
	`created_at` datetime(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(3),
	CONSTRAINT `sessions_sessionToken` PRIMARY KEY(`sessionToken`)
);
--> statement-breakpoint
CREATE TABLE `studio_members` (
	`id` bigint unsigned AUTO_INCREMENT NOT NULL,
	`studio_id` bigint unsigned NOT NULL,
	`user_id` varchar(255) NOT NULL,
	`role` enum('owner','designer') NOT NULL,
	`created_at` datetime(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(3),
	CONSTRAINT `studio_members_id` PRIMARY KEY(`id`),
	CONSTRAINT `studio_members_studio_user` UNIQUE(`studio_id`,`user_id`)
);
--> statement-breakpoint
CREATE TABLE `studios` (
	`id` bigint unsigned AUTO_INCREMENT NOT NULL,
	`name` varchar(200) NOT NULL,
	`town` varchar(200) NOT NULL DEFAULT '',
	`settings` longtext NOT NULL,
	`created_at` datetime(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(3),
	CONSTRAINT `studios_id` PRIMARY KEY(`id`)
);
--> statement-breakpoint
CREATE TABLE `trail_events` (
	`id` bigint unsigned AUTO_INCREMENT NOT NULL,
	`commission_id` bigint unsigned NOT NULL,
	`seq` int unsigned NOT NULL,
	`at` datetime(3) NOT NULL,
	`actor_id` varchar(255),
	`actor_role` varchar(20) NOT NULL,
	`action` varchar(60) NOT NULL,
	`subject_type` varchar(40) NOT NULL,
	`subject_id` varchar(64) NOT NULL,
	`payload` longtext NOT NULL,
	`prev_hash` varchar(64) NOT NULL,
	`hash` varchar(64) NOT NULL,
	CONSTRAINT `trail_events_id` PRIMARY KEY(`id`),
	CONSTRAINT `trail_events_commission_seq` UNIQUE(`commission_id`,`seq`)
);
--> statement-breakpoint
CREATE TABLE `users` (
	`id` varchar(255) NOT NULL,
	`name` varchar(255),
	`email` varchar(255) NOT NULL,
	`emailVerified` timestamp(3),
	`image` varchar(255),
	`units` enum('mm','in') NOT NULL DEFAULT 'mm',
	`notices` enum('immediate','digest') NOT NULL DEFAULT 'immediate',
	`created_at` datetime(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(3),
	CONSTRAINT `users_id` PRIMARY KEY(`id`),
	CONSTRAINT `users_email_unique` UNIQUE(`email`)
);
--> statement-breakpoint
CREATE TABLE `verification_tokens` (
	`identifier` varchar(255) NOT NULL,
	`token` varchar(255) NOT NULL,
	`expires` timestamp NOT NULL,
	CONSTRAINT `verification_tokens_identifier_token_pk` PRIMARY KEY(`identifier`,`token`)
);
--> statement-breakpoint
ALTER TABLE `accounts` ADD CONSTRAINT `accounts_userId_users_id_fk` FOREIGN KEY (`userId`) REFERENCES `users`(`id`) ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `commission_members` ADD CONSTRAINT `commission_members_commission_id_commissions_id_fk` FOREIGN KEY (`commission_id`) REFERENCES `commissions`(`id`) ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `commission_members` ADD CONSTRAINT `commission_members_user_id_users_id_fk` FOREIGN KEY (`user_id`) REFERENCES `users`(`id`) ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `commission_members` ADD CONSTRAINT `commission_members_invited_by_users_id_fk` FOREIGN KEY (`invited_by`) REFERENCES `users`(`id`) ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `commissions` ADD CONSTRAINT `commissions_studio_id_studios_id_fk` FOREIGN KEY (`studio_id`) REFERENCES `studios`(`id`) ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `sessions` ADD CONSTRAINT `sessions_userId_users_id_fk` FOREIGN KEY (`userId`) REFERENCES `users`(`id`) ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `studio_members` ADD CONSTRAINT `studio_members_studio_id_studios_id_fk` FOREIGN KEY (`studio_id`) REFERENCES `studios`(`id`) ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `studio_members` ADD CONSTRAINT `studio_members_user_id_users_id_fk` FOREIGN KEY (`user_id`) REFERENCES `users`(`id`) ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `trail_events` ADD CONSTRAINT `trail_events_commission_id_commissions_id_fk` FOREIGN KEY (`commission_id`) REFERENCES `commissions`(`id`) ON DELETE no action ON UPDATE no action;--> statement-breakpoint
CREATE INDEX `commissions_studio` ON `commissions` (`studio_id`);--> statement-breakpoint
CREATE INDEX `security_log_user` ON `security_log` (`user_id`);