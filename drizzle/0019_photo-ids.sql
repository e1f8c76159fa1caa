ALTER TABLE `item_photos` ADD `public_id` varchar(32);--> statement-breakpoint
UPDATE `item_photos` SET `public_id` = LEFT(SHA2(CONCAT(`storage_key`, UUID(), RAND(), `id`), 256), 32);--> statement-breakpoint
ALTER TABLE `item_photos` MODIFY `public_id` varchar(32) NOT NULL;--> statement-breakpoint
ALTER TABLE `item_photos` ADD CONSTRAINT `item_photos_public_uq` UNIQUE(`public_id`);
