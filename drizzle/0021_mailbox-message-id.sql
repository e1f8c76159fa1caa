ALTER TABLE `mailbox_messages` ADD `message_id` varchar(255);--> statement-breakpoint
ALTER TABLE `mailbox_messages` ADD CONSTRAINT `mailbox_messages_message_id_unique` UNIQUE(`message_id`);