ALTER TABLE `users` ADD `language` varchar(8);--> statement-breakpoint
ALTER TABLE `repair_groups` ADD `default_language` varchar(8) DEFAULT 'en' NOT NULL;--> statement-breakpoint
ALTER TABLE `bookings` ADD `language` varchar(8) DEFAULT 'en' NOT NULL;