ALTER TABLE `users` ADD `calendar_feed_hash` char(64);--> statement-breakpoint
ALTER TABLE `repair_groups` ADD `currency` char(3) DEFAULT 'GBP' NOT NULL;--> statement-breakpoint
ALTER TABLE `users` ADD CONSTRAINT `users_calendar_feed_uq` UNIQUE(`calendar_feed_hash`);