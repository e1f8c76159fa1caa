CREATE TABLE `knowledge_entries` (
	`item_id` bigint unsigned NOT NULL,
	`group_id` bigint unsigned NOT NULL,
	`category_id` bigint unsigned NOT NULL,
	`brand` varchar(80) NOT NULL DEFAULT '',
	`model` varchar(80) NOT NULL DEFAULT '',
	`outcome` enum('fixed','parts-needed','advice','end-of-life') NOT NULL,
	`symptom` text NOT NULL,
	`notes` text NOT NULL,
	`measured` text NOT NULL,
	`faulty_part` varchar(200) NOT NULL DEFAULT '',
	`fix` text NOT NULL,
	`written_up` boolean NOT NULL DEFAULT false,
	`author_id` bigint unsigned,
	`event_date` datetime(3) NOT NULL,
	`created_at` datetime(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(3),
	CONSTRAINT `knowledge_entries_item_id` PRIMARY KEY(`item_id`)
);
--> statement-breakpoint
CREATE TABLE `salvage_parts` (
	`id` bigint unsigned AUTO_INCREMENT NOT NULL,
	`group_id` bigint unsigned NOT NULL,
	`type` enum('resistor','capacitor','diode','bipolar-transistor','mosfet','fuse','thermal-cutout','motor','switch','power-supply','cable','other') NOT NULL,
	`value` varchar(120) NOT NULL,
	`ratings` json NOT NULL,
	`package` varchar(40) NOT NULL DEFAULT '',
	`pinout` varchar(20) NOT NULL DEFAULT '',
	`quantity` int NOT NULL,
	`box` varchar(60) NOT NULL,
	`source_item_id` bigint unsigned,
	`notes` varchar(300) NOT NULL DEFAULT '',
	`added_by` bigint unsigned,
	`created_at` datetime(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(3),
	CONSTRAINT `salvage_parts_id` PRIMARY KEY(`id`)
);
--> statement-breakpoint
CREATE TABLE `salvage_takes` (
	`id` bigint unsigned AUTO_INCREMENT NOT NULL,
	`part_id` bigint unsigned NOT NULL,
	`item_id` bigint unsigned,
	`quantity` int NOT NULL,
	`taken_by` bigint unsigned,
	`created_at` datetime(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(3),
	CONSTRAINT `salvage_takes_id` PRIMARY KEY(`id`)
);
--> statement-breakpoint
ALTER TABLE `repair_groups` ADD `share_knowledge` boolean DEFAULT false NOT NULL;--> statement-breakpoint
ALTER TABLE `knowledge_entries` ADD CONSTRAINT `knowledge_entries_item_id_booking_items_id_fk` FOREIGN KEY (`item_id`) REFERENCES `booking_items`(`id`) ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `knowledge_entries` ADD CONSTRAINT `knowledge_entries_group_id_repair_groups_id_fk` FOREIGN KEY (`group_id`) REFERENCES `repair_groups`(`id`) ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `knowledge_entries` ADD CONSTRAINT `knowledge_entries_category_id_categories_id_fk` FOREIGN KEY (`category_id`) REFERENCES `categories`(`id`) ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `knowledge_entries` ADD CONSTRAINT `knowledge_entries_author_id_users_id_fk` FOREIGN KEY (`author_id`) REFERENCES `users`(`id`) ON DELETE set null ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `salvage_parts` ADD CONSTRAINT `salvage_parts_group_id_repair_groups_id_fk` FOREIGN KEY (`group_id`) REFERENCES `repair_groups`(`id`) ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `salvage_parts` ADD CONSTRAINT `salvage_parts_source_item_id_booking_items_id_fk` FOREIGN KEY (`source_item_id`) REFERENCES `booking_items`(`id`) ON DELETE set null ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `salvage_parts` ADD CONSTRAINT `salvage_parts_added_by_users_id_fk` FOREIGN KEY (`added_by`) REFERENCES `users`(`id`) ON DELETE set null ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `salvage_takes` ADD CONSTRAINT `salvage_takes_part_id_salvage_parts_id_fk` FOREIGN KEY (`part_id`) REFERENCES `salvage_parts`(`id`) ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `salvage_takes` ADD CONSTRAINT `salvage_takes_item_id_booking_items_id_fk` FOREIGN KEY (`item_id`) REFERENCES `booking_items`(`id`) ON DELETE set null ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `salvage_takes` ADD CONSTRAINT `salvage_takes_taken_by_users_id_fk` FOREIGN KEY (`taken_by`) REFERENCES `users`(`id`) ON DELETE set null ON UPDATE no action;--> statement-breakpoint
CREATE INDEX `knowledge_group_cat_idx` ON `knowledge_entries` (`group_id`,`category_id`);--> statement-breakpoint
CREATE INDEX `knowledge_cat_idx` ON `knowledge_entries` (`category_id`);--> statement-breakpoint
CREATE INDEX `salvage_group_type_idx` ON `salvage_parts` (`group_id`,`type`);--> statement-breakpoint
CREATE INDEX `salvage_takes_item_idx` ON `salvage_takes` (`item_id`);