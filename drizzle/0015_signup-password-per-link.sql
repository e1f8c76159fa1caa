ALTER TABLE `auth_tokens` ADD `password_hash` varchar(255);--> statement-breakpoint
ALTER TABLE `auth_tokens` ADD `name` varchar(120);