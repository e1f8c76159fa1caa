ALTER TABLE `repair_groups` ADD `retention_months` int DEFAULT 12 NOT NULL;--> statement-breakpoint
ALTER TABLE `repair_groups` ADD `contact_email` varchar(254);--> statement-breakpoint
ALTER TABLE `repair_groups` ADD `retention_ran_at` datetime(3);--> statement-breakpoint
ALTER TABLE `repair_groups` ADD `retention_anonymised` int DEFAULT 0 NOT NULL;--> statement-breakpoint
ALTER TABLE `bookings` ADD `anonymised_at` datetime(3);