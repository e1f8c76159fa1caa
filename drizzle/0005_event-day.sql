CREATE TABLE `item_outcomes` (
	`item_id` bigint unsigned NOT NULL,
	`outcome` enum('fixed','parts-needed','advice','end-of-life') NOT NULL,
	`barrier` enum('spare-parts-not-available','spare-parts-too-expensive','no-way-to-open','repair-information-not-available','lack-of-equipment','too-worn-out'),
	`part_description` varchar(200),
	`part_link` varchar(300),
	`part_cost_cents` int,
	`minutes` int,
	`notes` text,
	`safety_check_id` bigint unsigned,
	`recorded_by` bigint unsigned,
	`recorded_at` datetime(3) NOT NULL,
	CONSTRAINT `item_outcomes_item_id` PRIMARY KEY(`item_id`)
);
--> statement-breakpoint
CREATE TABLE `item_status_changes` (
	`id` bigint unsigned AUTO_INCREMENT NOT NULL,
	`item_id` bigint unsigned NOT NULL,
	`from_status` enum('booked','checked-in','waiting','at-bench','done','no-show','withdrawn'),
	`to_status` enum('booked','checked-in','waiting','at-bench','done','no-show','withdrawn') NOT NULL,
	`by_user_id` bigint unsigned,
	`note` varchar(200),
	`created_at` datetime(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(3),
	CONSTRAINT `item_status_changes_id` PRIMARY KEY(`id`)
);
--> statement-breakpoint
CREATE TABLE `safety_checks` (
	`id` bigint unsigned AUTO_INCREMENT NOT NULL,
	`item_id` bigint unsigned NOT NULL,
	`appliance_class` enum('I','II','III') NOT NULL,
	`readings` json NOT NULL,
	`instrument` varchar(120),
	`pass` boolean NOT NULL,
	`failures` json NOT NULL,
	`checked_by` bigint unsigned,
	`created_at` datetime(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(3),
	CONSTRAINT `safety_checks_id` PRIMARY KEY(`id`)
);
--> statement-breakpoint
ALTER TABLE `bookings` MODIFY COLUMN `visitor_email` varchar(254);--> statement-breakpoint
ALTER TABLE `booking_items` ADD `status` enum('booked','checked-in','waiting','at-bench','done','no-show','withdrawn') DEFAULT 'booked' NOT NULL;--> statement-breakpoint
ALTER TABLE `booking_items` ADD `tag_code` char(5);--> statement-breakpoint
ALTER TABLE `booking_items` ADD `queue_number` int;--> statement-breakpoint
ALTER TABLE `booking_items` ADD `weighed_kg` decimal(8,3);--> statement-breakpoint
ALTER TABLE `booking_items` ADD `checked_in_at` datetime(3);--> statement-breakpoint
ALTER TABLE `booking_items` ADD `started_at` datetime(3);--> statement-breakpoint
ALTER TABLE `booking_items` ADD `done_at` datetime(3);--> statement-breakpoint
ALTER TABLE `bookings` ADD `walk_in` boolean DEFAULT false NOT NULL;--> statement-breakpoint
ALTER TABLE `bookings` ADD `consent_name` varchar(120);--> statement-breakpoint
ALTER TABLE `events` ADD `queue_counter` int DEFAULT 0 NOT NULL;--> statement-breakpoint
ALTER TABLE `booking_items` ADD CONSTRAINT `booking_items_tag_uq` UNIQUE(`tag_code`);--> statement-breakpoint
ALTER TABLE `item_outcomes` ADD CONSTRAINT `item_outcomes_item_id_booking_items_id_fk` FOREIGN KEY (`item_id`) REFERENCES `booking_items`(`id`) ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `item_outcomes` ADD CONSTRAINT `item_outcomes_safety_check_id_safety_checks_id_fk` FOREIGN KEY (`safety_check_id`) REFERENCES `safety_checks`(`id`) ON DELETE set null ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `item_outcomes` ADD CONSTRAINT `item_outcomes_recorded_by_users_id_fk` FOREIGN KEY (`recorded_by`) REFERENCES `users`(`id`) ON DELETE set null ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `item_status_changes` ADD CONSTRAINT `item_status_changes_item_id_booking_items_id_fk` FOREIGN KEY (`item_id`) REFERENCES `booking_items`(`id`) ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `item_status_changes` ADD CONSTRAINT `item_status_changes_by_user_id_users_id_fk` FOREIGN KEY (`by_user_id`) REFERENCES `users`(`id`) ON DELETE set null ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `safety_checks` ADD CONSTRAINT `safety_checks_item_id_booking_items_id_fk` FOREIGN KEY (`item_id`) REFERENCES `booking_items`(`id`) ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `safety_checks` ADD CONSTRAINT `safety_checks_checked_by_users_id_fk` FOREIGN KEY (`checked_by`) REFERENCES `users`(`id`) ON DELETE set null ON UPDATE no action;--> statement-breakpoint
CREATE INDEX `item_outcomes_outcome_idx` ON `item_outcomes` (`outcome`);--> statement-breakpoint
CREATE INDEX `item_status_changes_item_idx` ON `item_status_changes` (`item_id`,`id`);--> statement-breakpoint
CREATE INDEX `safety_checks_item_idx` ON `safety_checks` (`item_id`,`id`);--> statement-breakpoint
CREATE INDEX `booking_items_status_idx` ON `booking_items` (`status`);