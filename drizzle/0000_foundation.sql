CREATE TABLE `auth_tokens` (
	`id` bigint unsigned AUTO_INCREMENT NOT NULL,
	`user_id` bigint unsigned NOT NULL,
	`purpose` enum('verify-email','reset-password') NOT NULL,
	`token_hash` char(64) NOT NULL,
	`expires_at` datetime(3) NOT NULL,
	`used_at` datetime(3),
	`created_at` datetime(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(3),
	CONSTRAINT `auth_tokens_id` PRIMARY KEY(`id`),
	CONSTRAINT `auth_tokens_hash_uq` UNIQUE(`token_hash`)
);
--> statement-breakpoint
CREATE TABLE `users` (
	`id` bigint unsigned AUTO_INCREMENT NOT NULL,
	`email` varchar(254) NOT NULL,
	`name` varchar(120) NOT NULL,
	`password_hash` varchar(255),
	`admin` boolean NOT NULL DEFAULT false,
	`email_verified_at` datetime(3),
	`created_at` datetime(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(3),
	CONSTRAINT `users_id` PRIMARY KEY(`id`),
	CONSTRAINT `users_email_uq` UNIQUE(`email`)
);
--> statement-breakpoint
CREATE TABLE `memberships` (
	`id` bigint unsigned AUTO_INCREMENT NOT NULL,
	`user_id` bigint unsigned NOT NULL,
	`group_id` bigint unsigned NOT NULL,
	`role` enum('organiser','host','fixer') NOT NULL,
	`status` enum('active','pending') NOT NULL DEFAULT 'active',
	`created_at` datetime(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(3),
	CONSTRAINT `memberships_id` PRIMARY KEY(`id`),
	CONSTRAINT `memberships_uq` UNIQUE(`user_id`,`group_id`,`role`)
);
--> statement-breakpoint
CREATE TABLE `repair_groups` (
	`id` bigint unsigned AUTO_INCREMENT NOT NULL,
	`name` varchar(120) NOT NULL,
	`slug` varchar(80) NOT NULL,
	`town` varchar(120) NOT NULL,
	`description` text NOT NULL,
	`created_at` datetime(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(3),
	CONSTRAINT `repair_groups_id` PRIMARY KEY(`id`),
	CONSTRAINT `repair_groups_slug_uq` UNIQUE(`slug`)
);
--> statement-breakpoint
CREATE TABLE `venues` (
	`id` bigint unsigned AUTO_INCREMENT NOT NULL,
	`group_id` bigint unsigned NOT NULL,
	`name` varchar(160) NOT NULL,
	`address` varchar(255) NOT NULL,
	`town` varchar(120) NOT NULL,
	`access_notes` text NOT NULL,
	`created_at` datetime(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(3),
	CONSTRAINT `venues_id` PRIMARY KEY(`id`)
);
--> statement-breakpoint
CREATE TABLE `mailbox_messages` (
	`id` bigint unsigned AUTO_INCREMENT NOT NULL,
	`from_address` varchar(320) NOT NULL,
	`to_address` varchar(1000) NOT NULL,
	`subject` varchar(255) NOT NULL,
	`html` mediumtext,
	`text` mediumtext,
	`raw` mediumtext NOT NULL,
	`created_at` datetime(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(3),
	CONSTRAINT `mailbox_messages_id` PRIMARY KEY(`id`)
);
--> statement-breakpoint
CREATE TABLE `outbox` (
	`id` bigint unsigned AUTO_INCREMENT NOT NULL,
	`to_address` varchar(254) NOT NULL,
	`subject` varchar(255) NOT NULL,
	`html` mediumtext NOT NULL,
	`text` mediumtext NOT NULL,
	`attachments` json,
	`status` enum('pending','sent','failed') NOT NULL DEFAULT 'pending',
	`attempts` int unsigned NOT NULL DEFAULT 0,
	`next_attempt_at` datetime(3) NOT NULL,
	`last_error` varchar(500),
	`created_at` datetime(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(3),
	`sent_at` datetime(3),
	CONSTRAINT `outbox_id` PRIMARY KEY(`id`)
);
--> statement-breakpoint
CREATE TABLE `rate_limits` (
	`rate_key` varchar(191) NOT NULL,
	`hits` int unsigned NOT NULL,
	`reset_at` datetime(3) NOT NULL,
	CONSTRAINT `rate_limits_rate_key` PRIMARY KEY(`rate_key`)
);
--> statement-breakpoint
CREATE TABLE `sessions` (
	`session_id` varchar(128) NOT NULL,
	`expires` int unsigned NOT NULL,
	`data` mediumtext,
	CONSTRAINT `sessions_session_id` PRIMARY KEY(`session_id`)
);
--> statement-breakpoint
CREATE TABLE `settings` (
	`setting_key` varchar(64) NOT NULL,
	`value` json NOT NULL,
	CONSTRAINT `settings_setting_key` PRIMARY KEY(`setting_key`)
);
--> statement-breakpoint
ALTER TABLE `auth_tokens` ADD CONSTRAINT `auth_tokens_user_id_users_id_fk` FOREIGN KEY (`user_id`) REFERENCES `users`(`id`) ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `memberships` ADD CONSTRAINT `memberships_user_id_users_id_fk` FOREIGN KEY (`user_id`) REFERENCES `users`(`id`) ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `memberships` ADD CONSTRAINT `memberships_group_id_repair_groups_id_fk` FOREIGN KEY (`group_id`) REFERENCES `repair_groups`(`id`) ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `venues` ADD CONSTRAINT `venues_group_id_repair_groups_id_fk` FOREIGN KEY (`group_id`) REFERENCES `repair_groups`(`id`) ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
CREATE INDEX `auth_tokens_user_idx` ON `auth_tokens` (`user_id`,`purpose`);--> statement-breakpoint
CREATE INDEX `memberships_group_idx` ON `memberships` (`group_id`,`status`);--> statement-breakpoint
CREATE INDEX `venues_group_idx` ON `venues` (`group_id`);--> statement-breakpoint
CREATE INDEX `outbox_status_id_idx` ON `outbox` (`status`,`id`);--> statement-breakpoint
CREATE INDEX `sessions_expires_idx` ON `sessions` (`expires`);