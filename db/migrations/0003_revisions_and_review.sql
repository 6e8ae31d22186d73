CREATE TABLE `attachments` (
	`id` bigint unsigned AUTO_INCREMENT NOT NULL,
	`revision_id` bigint unsigned NOT NULL,
	`commission_id` bigint unsigned NOT NULL,
	`storage_key` varchar(200) NOT NULL,
	`thumb_key` varchar(200),
	`kind` enum('png','jpeg','webp','pdf') NOT NULL,
	`mime` varchar(50) NOT NULL,
	`name` varchar(255) NOT NULL,
	`caption` varchar(500) NOT NULL DEFAULT '',
	`sha256` varchar(64) NOT NULL,
	`size_bytes` int unsigned NOT NULL,
	`width` int unsigned,
	`height` int unsigned,
	`pages` int unsigned,
	`position` int unsigned NOT NULL DEFAULT 0,
	`uploaded_by` varchar(255) NOT NULL,
	`created_at` datetime(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(3),
	CONSTRAINT `attachments_id` PRIMARY KEY(`id`)
);
--> statement-breakpoint
CREATE TABLE `ballots` (
	`id` bigint unsigned AUTO_INCREMENT NOT NULL,
	`revision_id` bigint unsigned NOT NULL,
	`commission_id` bigint unsigned NOT NULL,
	`kind` enum('electronic','meeting') NOT NULL,
	`status` enum('open','closed','withdrawn') NOT NULL,
	`motion` varchar(500) NOT NULL,
	`opened_by` varchar(255) NOT NULL,
	`opened_at` datetime(3) NOT NULL,
	`closes_at` datetime(3),
	`closed_at` datetime(3),
	`meeting_date` varchar(10),
	`result` longtext,
	CONSTRAINT `ballots_id` PRIMARY KEY(`id`)
);
--> statement-breakpoint
CREATE TABLE `comments` (
	`id` bigint unsigned AUTO_INCREMENT NOT NULL,
	`revision_id` bigint unsigned NOT NULL,
	`commission_id` bigint unsigned NOT NULL,
	`parent_id` bigint unsigned,
	`author_id` varchar(255) NOT NULL,
	`body` text NOT NULL,
	`target` longtext NOT NULL,
	`resolved_at` datetime(3),
	`resolved_by` varchar(255),
	`edited_at` datetime(3),
	`created_at` datetime(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(3),
	CONSTRAINT `comments_id` PRIMARY KEY(`id`)
);
--> statement-breakpoint
CREATE TABLE `decisions` (
	`id` bigint unsigned AUTO_INCREMENT NOT NULL,
	`revision_id` bigint unsigned NOT NULL,
	`commission_id` bigint unsigned NOT NULL,
	`outcome` enum('approved','approved-as-noted','revise-and-resubmit','not-approved') NOT NULL,
	`conditions` longtext NOT NULL,
	`statement` text NOT NULL,
	`ballot_id` bigint unsigned,
	`content_hash` varchar(64) NOT NULL,
	`recorded_by` varchar(255) NOT NULL,
	`recorded_at` datetime(3) NOT NULL,
	CONSTRAINT `decisions_id` PRIMARY KEY(`id`),
	CONSTRAINT `decisions_revision` UNIQUE(`revision_id`)
);
--> statement-breakpoint
CREATE TABLE `revisions` (
	`id` bigint unsigned AUTO_INCREMENT NOT NULL,
	`commission_id` bigint unsigned NOT NULL,
	`number` int unsigned NOT NULL,
	`state` enum('draft','circulated','superseded','decided') NOT NULL DEFAULT 'draft',
	`params` longtext NOT NULL,
	`figures` longtext,
	`note` text NOT NULL,
	`content_hash` varchar(64),
	`created_by` varchar(255) NOT NULL,
	`circulated_by` varchar(255),
	`circulated_at` datetime(3),
	`superseded_at` datetime(3),
	`created_at` datetime(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(3),
	`updated_at` datetime(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(3),
	CONSTRAINT `revisions_id` PRIMARY KEY(`id`),
	CONSTRAINT `revisions_commission_number` UNIQUE(`commission_id`,`number`)
);
--> statement-breakpoint
CREATE TABLE `votes` (
	`id` bigint unsigned AUTO_INCREMENT NOT NULL,
	`ballot_id` bigint unsigned NOT NULL,
	`user_id` varchar(255) NOT NULL,
	`choice` enum('in-favour','against','abstain') NOT NULL,
	`cast_at` datetime(3) NOT NULL,
	CONSTRAINT `votes_id` PRIMARY KEY(`id`),
	CONSTRAINT `votes_ballot_user` UNIQUE(`ballot_id`,`user_id`)
);
--> statement-breakpoint
ALTER TABLE `attachments` ADD CONSTRAINT `attachments_revision_id_revisions_id_fk` FOREIGN KEY (`revision_id`) REFERENCES `revisions`(`id`) ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `attachments` ADD CONSTRAINT `attachments_commission_id_commissions_id_fk` FOREIGN KEY (`commission_id`) REFERENCES `commissions`(`id`) ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `attachments` ADD CONSTRAINT `attachments_uploaded_by_users_id_fk` FOREIGN KEY (`uploaded_by`) REFERENCES `users`(`id`) ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `ballots` ADD CONSTRAINT `ballots_revision_id_revisions_id_fk` FOREIGN KEY (`revision_id`) REFERENCES `revisions`(`id`) ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `ballots` ADD CONSTRAINT `ballots_commission_id_commissions_id_fk` FOREIGN KEY (`commission_id`) REFERENCES `commissions`(`id`) ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `ballots` ADD CONSTRAINT `ballots_opened_by_users_id_fk` FOREIGN KEY (`opened_by`) REFERENCES `users`(`id`) ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `comments` ADD CONSTRAINT `comments_revision_id_revisions_id_fk` FOREIGN KEY (`revision_id`) REFERENCES `revisions`(`id`) ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `comments` ADD CONSTRAINT `comments_commission_id_commissions_id_fk` FOREIGN KEY (`commission_id`) REFERENCES `commissions`(`id`) ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `comments` ADD CONSTRAINT `comments_author_id_users_id_fk` FOREIGN KEY (`author_id`) REFERENCES `users`(`id`) ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `comments` ADD CONSTRAINT `comments_resolved_by_users_id_fk` FOREIGN KEY (`resolved_by`) REFERENCES `users`(`id`) ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `decisions` ADD CONSTRAINT `decisions_revision_id_revisions_id_fk` FOREIGN KEY (`revision_id`) REFERENCES `revisions`(`id`) ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `decisions` ADD CONSTRAINT `decisions_commission_id_commissions_id_fk` FOREIGN KEY (`commission_id`) REFERENCES `commissions`(`id`) ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `decisions` ADD CONSTRAINT `decisions_ballot_id_ballots_id_fk` FOREIGN KEY (`ballot_id`) REFERENCES `ballots`(`id`) ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `decisions` ADD CONSTRAINT `decisions_recorded_by_users_id_fk` FOREIGN KEY (`recorded_by`) REFERENCES `users`(`id`) ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `revisions` ADD CONSTRAINT `revisions_commission_id_commissions_id_fk` FOREIGN KEY (`commission_id`) REFERENCES `commissions`(`id`) ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `revisions` ADD CONSTRAINT `revisions_created_by_users_id_fk` FOREIGN KEY (`created_by`) REFERENCES `users`(`id`) ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `revisions` ADD CONSTRAINT `revisions_circulated_by_users_id_fk` FOREIGN KEY (`circulated_by`) REFERENCES `users`(`id`) ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `votes` ADD CONSTRAINT `votes_ballot_id_ballots_id_fk` FOREIGN KEY (`ballot_id`) REFERENCES `ballots`(`id`) ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `votes` ADD CONSTRAINT `votes_user_id_users_id_fk` FOREIGN KEY (`user_id`) REFERENCES `users`(`id`) ON DELETE no action ON UPDATE no action;--> statement-breakpoint
CREATE INDEX `attachments_revision` ON `attachments` (`revision_id`);--> statement-breakpoint
CREATE INDEX `ballots_revision` ON `ballots` (`revision_id`);--> statement-breakpoint
CREATE INDEX `comments_revision` ON `comments` (`revision_id`);