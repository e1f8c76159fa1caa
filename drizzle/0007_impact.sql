CREATE TABLE `follow_ups` (
	`item_id` bigint unsigned NOT NULL,
	`group_id` bigint unsigned NOT NULL,
	`status` enum('open','part-ordered','rebooked','came-back','fixed-at-return','gave-up') NOT NULL DEFAULT 'open',
	`mailed_at` datetime(3),
	`reminded_at` datetime(3),
	`return_item_id` bigint unsigned,
	`note` varchar(300),
	`created_at` datetime(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(3),
	`updated_at` datetime(3),
	CONSTRAINT `follow_ups_item_id` PRIMARY KEY(`item_id`)
);
--> statement-breakpoint
CREATE TABLE `impact_cells` (
	`event_id` bigint unsigned NOT NULL,
	`category_id` bigint unsigned NOT NULL,
	`group_id` bigint unsigned NOT NULL,
	`event_date` date NOT NULL,
	`items` int NOT NULL,
	`fixed` int NOT NULL,
	`parts_needed` int NOT NULL,
	`advice` int NOT NULL,
	`end_of_life` int NOT NULL,
	`fixed_weighed_kg` decimal(12,3) NOT NULL,
	`fixed_unweighed` int NOT NULL,
	`b_spare_parts_not_available` int NOT NULL DEFAULT 0,
	`b_spare_parts_too_expensive` int NOT NULL DEFAULT 0,
	`b_no_way_to_open` int NOT NULL DEFAULT 0,
	`b_repair_information_not_available` int NOT NULL DEFAULT 0,
	`b_lack_of_equipment` int NOT NULL DEFAULT 0,
	`b_too_worn_out` int NOT NULL DEFAULT 0,
	CONSTRAINT `impact_cells_event_id_category_id_pk` PRIMARY KEY(`event_id`,`category_id`)
);
--> statement-breakpoint
ALTER TABLE `categories` ADD `co2e_per_kg` decimal(10,5);--> statement-breakpoint
ALTER TABLE `categories` ADD `co2e_source` varchar(255);--> statement-breakpoint
ALTER TABLE `booking_items` ADD `return_of_item_id` bigint unsigned;--> statement-breakpoint
ALTER TABLE `events` ADD `thank_you_sent_at` datetime(3);--> statement-breakpoint
ALTER TABLE `follow_ups` ADD CONSTRAINT `follow_ups_item_id_booking_items_id_fk` FOREIGN KEY (`item_id`) REFERENCES `booking_items`(`id`) ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `follow_ups` ADD CONSTRAINT `follow_ups_group_id_repair_groups_id_fk` FOREIGN KEY (`group_id`) REFERENCES `repair_groups`(`id`) ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `impact_cells` ADD CONSTRAINT `impact_cells_event_id_events_id_fk` FOREIGN KEY (`event_id`) REFERENCES `events`(`id`) ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `impact_cells` ADD CONSTRAINT `impact_cells_category_id_categories_id_fk` FOREIGN KEY (`category_id`) REFERENCES `categories`(`id`) ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `impact_cells` ADD CONSTRAINT `impact_cells_group_id_repair_groups_id_fk` FOREIGN KEY (`group_id`) REFERENCES `repair_groups`(`id`) ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
CREATE INDEX `follow_ups_group_idx` ON `follow_ups` (`group_id`,`status`);--> statement-breakpoint
CREATE INDEX `follow_ups_due_idx` ON `follow_ups` (`status`,`created_at`);--> statement-breakpoint
CREATE INDEX `impact_cells_date_group_idx` ON `impact_cells` (`event_date`,`group_id`);--> statement-breakpoint
CREATE INDEX `impact_cells_group_date_idx` ON `impact_cells` (`group_id`,`event_date`);--> statement-breakpoint
CREATE INDEX `booking_items_return_idx` ON `booking_items` (`return_of_item_id`);