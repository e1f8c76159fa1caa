CREATE TABLE `read_generation` (
	`id` int unsigned NOT NULL,
	`generation` bigint unsigned NOT NULL DEFAULT 0,
	CONSTRAINT `read_generation_id` PRIMARY KEY(`id`)
);
