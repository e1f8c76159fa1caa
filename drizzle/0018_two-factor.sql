ALTER TABLE `users` ADD `totp_secret` varchar(255);--> statement-breakpoint
ALTER TABLE `users` ADD `totp_pending` varchar(255);--> statement-breakpoint
ALTER TABLE `users` ADD `totp_last_step` bigint;