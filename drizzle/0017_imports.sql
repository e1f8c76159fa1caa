CREATE TABLE `import_jobs` (
	`id` bigint unsigned AUTO_INCREMENT NOT NULL,
	`group_id` bigint unsigned,
	`scope` enum('group','network') NOT NULL,
	`created_by` bigint unsigned,
	`file_name` varchar(200) NOT NULL,
	`content` longtext NOT NULL,
	`mapping` json NOT NULL,
	`kind` varchar(16) NOT NULL,
	`status` enum('queued','running','done','failed') NOT NULL DEFAULT 'queued',
	`total` int NOT NULL DEFAULT 0,
	`imported` int NOT NULL DEFAULT 0,
	`skipped` int NOT NULL DEFAULT 0,
	`position` int NOT NULL DEFAULT 0,
	`refused_count` int NOT NULL DEFAULT 0,
	`refusals` json NOT NULL,
	`message` text,
	`lease_until` datetime(3),
	`created_at` datetime(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(3),
	`finished_at` datetime(3),
	CONSTRAINT `import_jobs_id` PRIMARY KEY(`id`)
);
--> statement-breakpoint
CREATE TABLE `imported_records` (
	`id` bigint unsigned AUTO_INCREMENT NOT NULL,
	`provider` varchar(80) NOT NULL,
	`record_id` varchar(80) NOT NULL,
	`item_id` bigint unsigned NOT NULL,
	`job_id` bigint unsigned,
	`ords_category` varchar(80),
	CONSTRAINT `imported_records_id` PRIMARY KEY(`id`),
	CONSTRAINT `imported_records_key_uq` UNIQUE(`provider`,`record_id`)
);
--> statement-breakpoint
ALTER TABLE `repair_groups` ADD `history_only` boolean DEFAULT false NOT NULL;--> statement-breakpoint
ALTER TABLE `events` ADD `imported` boolean DEFAULT false NOT NULL;--> statement-breakpoint
ALTER TABLE `import_jobs` ADD CONSTRAINT `import_jobs_group_id_repair_groups_id_fk` FOREIGN KEY (`group_id`) REFERENCES `repair_groups`(`id`) ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `import_jobs` ADD CONSTRAINT `import_jobs_created_by_users_id_fk` FOREIGN KEY (`created_by`) REFERENCES `users`(`id`) ON DELETE set null ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `imported_records` ADD CONSTRAINT `imported_records_item_id_booking_items_id_fk` FOREIGN KEY (`item_id`) REFERENCES `booking_items`(`id`) ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `imported_records` ADD CONSTRAINT `imported_records_job_id_import_jobs_id_fk` FOREIGN KEY (`job_id`) REFERENCES `import_jobs`(`id`) ON DELETE set null ON UPDATE no action;--> statement-breakpoint
CREATE INDEX `import_jobs_status_idx` ON `import_jobs` (`status`,`lease_until`);--> statement-breakpoint
CREATE INDEX `import_jobs_group_idx` ON `import_jobs` (`group_id`);--> statement-breakpoint
CREATE INDEX `imported_records_item_idx` ON `imported_records` (`item_id`);