CREATE TABLE `event_benches` (
	`id` bigint unsigned AUTO_INCREMENT NOT NULL,
	`event_id` bigint unsigned NOT NULL,
	`name` varchar(80) NOT NULL,
	`seats` int NOT NULL,
	`equipment` json NOT NULL,
	`position` int NOT NULL DEFAULT 0,
	CONSTRAINT `event_benches_id` PRIMARY KEY(`id`)
);
--> statement-breakpoint
CREATE TABLE `item_assignments` (
	`item_id` bigint unsigned NOT NULL,
	`event_id` bigint unsigned NOT NULL,
	`user_id` bigint unsigned NOT NULL,
	`bench_id` bigint unsigned NOT NULL,
	`locked` boolean NOT NULL DEFAULT false,
	`source` enum('engine','hand') NOT NULL,
	`run_id` bigint unsigned,
	`created_at` datetime(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(3),
	CONSTRAINT `item_assignments_item_id` PRIMARY KEY(`item_id`)
);
--> statement-breakpoint
CREATE TABLE `shifts` (
	`id` bigint unsigned AUTO_INCREMENT NOT NULL,
	`event_id` bigint unsigned NOT NULL,
	`user_id` bigint unsigned NOT NULL,
	`coming` boolean NOT NULL,
	`starts_at` datetime(3) NOT NULL,
	`ends_at` datetime(3) NOT NULL,
	`bench_id` bigint unsigned,
	`created_at` datetime(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(3),
	CONSTRAINT `shifts_id` PRIMARY KEY(`id`),
	CONSTRAINT `shifts_event_user_uq` UNIQUE(`event_id`,`user_id`)
);
--> statement-breakpoint
CREATE TABLE `triage_runs` (
	`id` bigint unsigned AUTO_INCREMENT NOT NULL,
	`event_id` bigint unsigned NOT NULL,
	`slot_id` bigint unsigned,
	`input` json NOT NULL,
	`result` json NOT NULL,
	`locked_kept` int NOT NULL,
	`created_by` bigint unsigned,
	`created_at` datetime(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(3),
	CONSTRAINT `triage_runs_id` PRIMARY KEY(`id`)
);
--> statement-breakpoint
CREATE TABLE `venue_benches` (
	`id` bigint unsigned AUTO_INCREMENT NOT NULL,
	`venue_id` bigint unsigned NOT NULL,
	`name` varchar(80) NOT NULL,
	`seats` int NOT NULL,
	`equipment` json NOT NULL,
	`position` int NOT NULL DEFAULT 0,
	CONSTRAINT `venue_benches_id` PRIMARY KEY(`id`)
);
--> statement-breakpoint
CREATE TABLE `volunteer_profiles` (
	`user_id` bigint unsigned NOT NULL,
	`kit` json NOT NULL,
	`notes` text NOT NULL,
	CONSTRAINT `volunteer_profiles_user_id` PRIMARY KEY(`user_id`)
);
--> statement-breakpoint
CREATE TABLE `volunteer_skills` (
	`user_id` bigint unsigned NOT NULL,
	`skill` varchar(32) NOT NULL,
	`level` tinyint NOT NULL,
	CONSTRAINT `volunteer_skills_user_id_skill_pk` PRIMARY KEY(`user_id`,`skill`)
);
--> statement-breakpoint
ALTER TABLE `event_benches` ADD CONSTRAINT `event_benches_event_id_events_id_fk` FOREIGN KEY (`event_id`) REFERENCES `events`(`id`) ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `item_assignments` ADD CONSTRAINT `item_assignments_item_id_booking_items_id_fk` FOREIGN KEY (`item_id`) REFERENCES `booking_items`(`id`) ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `item_assignments` ADD CONSTRAINT `item_assignments_event_id_events_id_fk` FOREIGN KEY (`event_id`) REFERENCES `events`(`id`) ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `item_assignments` ADD CONSTRAINT `item_assignments_user_id_users_id_fk` FOREIGN KEY (`user_id`) REFERENCES `users`(`id`) ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `item_assignments` ADD CONSTRAINT `item_assignments_bench_id_event_benches_id_fk` FOREIGN KEY (`bench_id`) REFERENCES `event_benches`(`id`) ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `shifts` ADD CONSTRAINT `shifts_event_id_events_id_fk` FOREIGN KEY (`event_id`) REFERENCES `events`(`id`) ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `shifts` ADD CONSTRAINT `shifts_user_id_users_id_fk` FOREIGN KEY (`user_id`) REFERENCES `users`(`id`) ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `shifts` ADD CONSTRAINT `shifts_bench_id_event_benches_id_fk` FOREIGN KEY (`bench_id`) REFERENCES `event_benches`(`id`) ON DELETE set null ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `triage_runs` ADD CONSTRAINT `triage_runs_event_id_events_id_fk` FOREIGN KEY (`event_id`) REFERENCES `events`(`id`) ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `triage_runs` ADD CONSTRAINT `triage_runs_created_by_users_id_fk` FOREIGN KEY (`created_by`) REFERENCES `users`(`id`) ON DELETE set null ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `venue_benches` ADD CONSTRAINT `venue_benches_venue_id_venues_id_fk` FOREIGN KEY (`venue_id`) REFERENCES `venues`(`id`) ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `volunteer_profiles` ADD CONSTRAINT `volunteer_profiles_user_id_users_id_fk` FOREIGN KEY (`user_id`) REFERENCES `users`(`id`) ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `volunteer_skills` ADD CONSTRAINT `volunteer_skills_user_id_users_id_fk` FOREIGN KEY (`user_id`) REFERENCES `users`(`id`) ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
CREATE INDEX `event_benches_event_idx` ON `event_benches` (`event_id`);--> statement-breakpoint
CREATE INDEX `item_assignments_event_idx` ON `item_assignments` (`event_id`);--> statement-breakpoint
CREATE INDEX `item_assignments_user_idx` ON `item_assignments` (`user_id`);--> statement-breakpoint
CREATE INDEX `triage_runs_event_idx` ON `triage_runs` (`event_id`,`id`);--> statement-breakpoint
CREATE INDEX `venue_benches_venue_idx` ON `venue_benches` (`venue_id`);