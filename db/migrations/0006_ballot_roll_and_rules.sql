ALTER TABLE `commissions` ADD `rules_confirmed_at` datetime(3);--> statement-breakpoint
ALTER TABLE `commissions` ADD `rules_confirmed_by` varchar(255);--> statement-breakpoint
ALTER TABLE `commissions` ADD CONSTRAINT `commissions_rules_confirmed_by_users_id_fk` FOREIGN KEY (`rules_confirmed_by`) REFERENCES `users`(`id`) ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `ballots` ADD `minutes_ref` varchar(500);--> statement-breakpoint
CREATE TABLE `ballot_roll` (
	`id` bigint unsigned AUTO_INCREMENT NOT NULL,
	`ballot_id` bigint unsigned NOT NULL,
	`user_id` varchar(255) NOT NULL,
	`name` varchar(255) NOT NULL,
	`role` enum('chair','member') NOT NULL,
	`position` int unsigned NOT NULL,
	CONSTRAINT `ballot_roll_id` PRIMARY KEY(`id`),
	CONSTRAINT `ballot_roll_ballot_user` UNIQUE(`ballot_id`,`user_id`)
);
--> statement-breakpoint
ALTER TABLE `ballot_roll` ADD CONSTRAINT `ballot_roll_ballot_id_ballots_id_fk` FOREIGN KEY (`ballot_id`) REFERENCES `ballots`(`id`) ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `ballot_roll` ADD CONSTRAINT `ballot_roll_user_id_users_id_fk` FOREIGN KEY (`user_id`) REFERENCES `users`(`id`) ON DELETE no action ON UPDATE no action;--> statement-breakpoint
INSERT INTO `ballot_roll` (`ballot_id`, `user_id`, `name`, `role`, `position`)
SELECT b.`id`, m.`user_id`, COALESCE(u.`name`, u.`email`), m.`role`, m.`id`
FROM `ballots` b
JOIN `commissions` c ON c.`id` = b.`commission_id`
JOIN `commission_members` m ON m.`commission_id` = b.`commission_id`
JOIN `users` u ON u.`id` = m.`user_id`
WHERE b.`status` = 'open' AND (m.`role` = 'member' OR (m.`role` = 'chair' AND c.`chair_votes` = 1));--> statement-breakpoint
UPDATE `commissions` c SET `rules_confirmed_at` = (SELECT MIN(b.`opened_at`) FROM `ballots` b WHERE b.`commission_id` = c.`id`)
WHERE EXISTS (SELECT 1 FROM `ballots` b WHERE b.`commission_id` = c.`id`);
