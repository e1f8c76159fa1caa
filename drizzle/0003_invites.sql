CREATE TABLE `invites` (
	`id` bigint unsigned AUTO_INCREMENT NOT NULL,
	`group_id` bigint unsigned NOT NULL,
	`email` varchar(254) NOT NULL,
	`role` enum('organiser','host','fixer') NOT NULL,
	`token_hash` varchar(64) NOT NULL,
	`expires_at` datetime(3) NOT NULL,
	`accepted_at` datetime(3),
	`invited_by` bigint unsigned,
	`created_at` datetime(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(3),
	CONSTRAINT `invites_id` PRIMARY KEY(`id`),
	CONSTRAINT `invites_token_uq` UNIQUE(`token_hash`)
);
--> statement-breakpoint
ALTER TABLE `invites` ADD CONSTRAINT `invites_group_id_repair_groups_id_fk` FOREIGN KEY (`group_id`) REFERENCES `repair_groups`(`id`) ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `invites` ADD CONSTRAINT `invites_invited_by_users_id_fk` FOREIGN KEY (`invited_by`) REFERENCES `users`(`id`) ON DELETE set null ON UPDATE no action;--> statement-breakpoint
CREATE INDEX `invites_group_idx` ON `invites` (`group_id`);