CREATE TABLE `categories` (
	`id` bigint unsigned AUTO_INCREMENT NOT NULL,
	`slug` varchar(60) NOT NULL,
	`name` varchar(120) NOT NULL,
	`weee_category` tinyint,
	`unu_key` varchar(8),
	`avg_weight_kg` decimal(8,3) NOT NULL,
	`weight_source` varchar(255) NOT NULL,
	`skill` varchar(32) NOT NULL,
	`equipment` json NOT NULL,
	`repair_minutes` int NOT NULL,
	`mains` boolean NOT NULL,
	`refusal` json,
	`sort` int NOT NULL DEFAULT 0,
	CONSTRAINT `categories_id` PRIMARY KEY(`id`),
	CONSTRAINT `categories_slug_uq` UNIQUE(`slug`)
);
--> statement-breakpoint
CREATE TABLE `group_exclusions` (
	`group_id` bigint unsigned NOT NULL,
	`category_id` bigint unsigned NOT NULL,
	CONSTRAINT `group_exclusions_group_id_category_id_pk` PRIMARY KEY(`group_id`,`category_id`)
);
--> statement-breakpoint
CREATE TABLE `booking_items` (
	`id` bigint unsigned AUTO_INCREMENT NOT NULL,
	`booking_id` bigint unsigned NOT NULL,
	`category_id` bigint unsigned NOT NULL,
	`brand` varchar(80),
	`model` varchar(80),
	`age_years` int,
	`fault` text NOT NULL,
	`mains` boolean NOT NULL,
	`battery` boolean NOT NULL DEFAULT false,
	`position` int NOT NULL,
	`created_at` datetime(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(3),
	CONSTRAINT `booking_items_id` PRIMARY KEY(`id`)
);
--> statement-breakpoint
CREATE TABLE `bookings` (
	`id` bigint unsigned AUTO_INCREMENT NOT NULL,
	`reference` char(7) NOT NULL,
	`event_id` bigint unsigned NOT NULL,
	`slot_id` bigint unsigned NOT NULL,
	`visitor_name` varchar(120) NOT NULL,
	`visitor_email` varchar(254) NOT NULL,
	`visitor_phone` varchar(40),
	`manage_token_hash` char(64) NOT NULL,
	`status` enum('confirmed','cancelled') NOT NULL DEFAULT 'confirmed',
	`consent_at` datetime(3) NOT NULL,
	`reminder_sent_at` datetime(3),
	`cancelled_at` datetime(3),
	`created_at` datetime(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(3),
	CONSTRAINT `bookings_id` PRIMARY KEY(`id`),
	CONSTRAINT `bookings_reference_uq` UNIQUE(`reference`)
);
--> statement-breakpoint
CREATE TABLE `events` (
	`id` bigint unsigned AUTO_INCREMENT NOT NULL,
	`group_id` bigint unsigned NOT NULL,
	`venue_id` bigint unsigned NOT NULL,
	`title` varchar(160) NOT NULL,
	`description` text NOT NULL,
	`starts_at` datetime(3) NOT NULL,
	`ends_at` datetime(3) NOT NULL,
	`slot_minutes` int NOT NULL,
	`slot_capacity` int NOT NULL,
	`skill_limits` json NOT NULL,
	`status` enum('draft','published','closed','cancelled') NOT NULL DEFAULT 'draft',
	`published_at` datetime(3),
	`cancelled_at` datetime(3),
	`created_at` datetime(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(3),
	CONSTRAINT `events_id` PRIMARY KEY(`id`)
);
--> statement-breakpoint
CREATE TABLE `idempotency_keys` (
	`idem_key` varchar(100) NOT NULL,
	`scope` varchar(40) NOT NULL,
	`status_code` int,
	`response` json,
	`created_at` datetime(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(3),
	CONSTRAINT `idempotency_keys_idem_key` PRIMARY KEY(`idem_key`)
);
--> statement-breakpoint
CREATE TABLE `item_photos` (
	`id` bigint unsigned AUTO_INCREMENT NOT NULL,
	`item_id` bigint unsigned NOT NULL,
	`storage_key` varchar(200) NOT NULL,
	`content_type` varchar(40) NOT NULL,
	`width` int NOT NULL,
	`height` int NOT NULL,
	`bytes` int NOT NULL,
	`created_at` datetime(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(3),
	CONSTRAINT `item_photos_id` PRIMARY KEY(`id`)
);
--> statement-breakpoint
CREATE TABLE `slot_skill_counts` (
	`slot_id` bigint unsigned NOT NULL,
	`skill` varchar(32) NOT NULL,
	`booked` int NOT NULL DEFAULT 0,
	CONSTRAINT `slot_skill_counts_slot_id_skill_pk` PRIMARY KEY(`slot_id`,`skill`)
);
--> statement-breakpoint
CREATE TABLE `slots` (
	`id` bigint unsigned AUTO_INCREMENT NOT NULL,
	`event_id` bigint unsigned NOT NULL,
	`starts_at` datetime(3) NOT NULL,
	`ends_at` datetime(3) NOT NULL,
	`capacity` int NOT NULL,
	`booked` int NOT NULL DEFAULT 0,
	`held` int NOT NULL DEFAULT 0,
	CONSTRAINT `slots_id` PRIMARY KEY(`id`)
);
--> statement-breakpoint
CREATE TABLE `waitlist_entries` (
	`id` bigint unsigned AUTO_INCREMENT NOT NULL,
	`event_id` bigint unsigned NOT NULL,
	`slot_id` bigint unsigned NOT NULL,
	`visitor_name` varchar(120) NOT NULL,
	`visitor_email` varchar(254) NOT NULL,
	`request` json NOT NULL,
	`places` int NOT NULL,
	`status` enum('waiting','offered','claimed','expired','withdrawn') NOT NULL DEFAULT 'waiting',
	`claim_token_hash` char(64),
	`offered_at` datetime(3),
	`offer_expires_at` datetime(3),
	`booking_id` bigint unsigned,
	`created_at` datetime(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(3),
	CONSTRAINT `waitlist_entries_id` PRIMARY KEY(`id`),
	CONSTRAINT `waitlist_claim_uq` UNIQUE(`claim_token_hash`)
);
--> statement-breakpoint
ALTER TABLE `repair_groups` ADD `house_rules` text;--> statement-breakpoint
ALTER TABLE `repair_groups` ADD `time_zone` varchar(64) DEFAULT 'Europe/London' NOT NULL;--> statement-breakpoint
ALTER TABLE `group_exclusions` ADD CONSTRAINT `group_exclusions_group_id_repair_groups_id_fk` FOREIGN KEY (`group_id`) REFERENCES `repair_groups`(`id`) ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `group_exclusions` ADD CONSTRAINT `group_exclusions_category_id_categories_id_fk` FOREIGN KEY (`category_id`) REFERENCES `categories`(`id`) ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `booking_items` ADD CONSTRAINT `booking_items_booking_id_bookings_id_fk` FOREIGN KEY (`booking_id`) REFERENCES `bookings`(`id`) ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `booking_items` ADD CONSTRAINT `booking_items_category_id_categories_id_fk` FOREIGN KEY (`category_id`) REFERENCES `categories`(`id`) ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `bookings` ADD CONSTRAINT `bookings_event_id_events_id_fk` FOREIGN KEY (`event_id`) REFERENCES `events`(`id`) ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `bookings` ADD CONSTRAINT `bookings_slot_id_slots_id_fk` FOREIGN KEY (`slot_id`) REFERENCES `slots`(`id`) ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `events` ADD CONSTRAINT `events_group_id_repair_groups_id_fk` FOREIGN KEY (`group_id`) REFERENCES `repair_groups`(`id`) ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `events` ADD CONSTRAINT `events_venue_id_venues_id_fk` FOREIGN KEY (`venue_id`) REFERENCES `venues`(`id`) ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `item_photos` ADD CONSTRAINT `item_photos_item_id_booking_items_id_fk` FOREIGN KEY (`item_id`) REFERENCES `booking_items`(`id`) ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `slot_skill_counts` ADD CONSTRAINT `slot_skill_counts_slot_id_slots_id_fk` FOREIGN KEY (`slot_id`) REFERENCES `slots`(`id`) ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `slots` ADD CONSTRAINT `slots_event_id_events_id_fk` FOREIGN KEY (`event_id`) REFERENCES `events`(`id`) ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `waitlist_entries` ADD CONSTRAINT `waitlist_entries_event_id_events_id_fk` FOREIGN KEY (`event_id`) REFERENCES `events`(`id`) ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `waitlist_entries` ADD CONSTRAINT `waitlist_entries_slot_id_slots_id_fk` FOREIGN KEY (`slot_id`) REFERENCES `slots`(`id`) ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
CREATE INDEX `booking_items_booking_idx` ON `booking_items` (`booking_id`);--> statement-breakpoint
CREATE INDEX `bookings_event_idx` ON `bookings` (`event_id`,`status`);--> statement-breakpoint
CREATE INDEX `bookings_slot_idx` ON `bookings` (`slot_id`);--> statement-breakpoint
CREATE INDEX `events_status_starts_idx` ON `events` (`status`,`starts_at`);--> statement-breakpoint
CREATE INDEX `events_group_idx` ON `events` (`group_id`,`starts_at`);--> statement-breakpoint
CREATE INDEX `item_photos_item_idx` ON `item_photos` (`item_id`);--> statement-breakpoint
CREATE INDEX `slots_event_idx` ON `slots` (`event_id`,`starts_at`);--> statement-breakpoint
CREATE INDEX `waitlist_slot_idx` ON `waitlist_entries` (`slot_id`,`status`,`id`);--> statement-breakpoint
CREATE INDEX `waitlist_offer_idx` ON `waitlist_entries` (`status`,`offer_expires_at`);