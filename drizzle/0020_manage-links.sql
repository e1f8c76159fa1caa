ALTER TABLE `bookings` ADD `manage_token_version` int DEFAULT 1 NOT NULL;--> statement-breakpoint
CREATE INDEX `bookings_email_idx` ON `bookings` (`visitor_email`);