CREATE TABLE `impact_days` (
	`event_date` date NOT NULL,
	`category_id` bigint unsigned NOT NULL,
	`items` int NOT NULL,
	`fixed` int NOT NULL,
	`parts_needed` int NOT NULL,
	`advice` int NOT NULL,
	`end_of_life` int NOT NULL,
	`fixed_weighed_kg` decimal(14,3) NOT NULL,
	`fixed_unweighed` int NOT NULL,
	`b_spare_parts_not_available` int NOT NULL DEFAULT 0,
	`b_spare_parts_too_expensive` int NOT NULL DEFAULT 0,
	`b_no_way_to_open` int NOT NULL DEFAULT 0,
	`b_repair_information_not_available` int NOT NULL DEFAULT 0,
	`b_lack_of_equipment` int NOT NULL DEFAULT 0,
	`b_too_worn_out` int NOT NULL DEFAULT 0,
	CONSTRAINT `impact_days_event_date_category_id_pk` PRIMARY KEY(`event_date`,`category_id`)
);
--> statement-breakpoint
ALTER TABLE `impact_days` ADD CONSTRAINT `impact_days_category_id_categories_id_fk` FOREIGN KEY (`category_id`) REFERENCES `categories`(`id`) ON DELETE no action ON UPDATE no action;--> statement-breakpoint
INSERT INTO `impact_days` (`event_date`, `category_id`, `items`, `fixed_unweighed`, `fixed`, `parts_needed`, `advice`, `end_of_life`, `b_spare_parts_not_available`, `b_spare_parts_too_expensive`, `b_no_way_to_open`, `b_repair_information_not_available`, `b_lack_of_equipment`, `b_too_worn_out`, `fixed_weighed_kg`) SELECT `event_date`, `category_id`, SUM(`items`), SUM(`fixed_unweighed`), SUM(`fixed`), SUM(`parts_needed`), SUM(`advice`), SUM(`end_of_life`), SUM(`b_spare_parts_not_available`), SUM(`b_spare_parts_too_expensive`), SUM(`b_no_way_to_open`), SUM(`b_repair_information_not_available`), SUM(`b_lack_of_equipment`), SUM(`b_too_worn_out`), SUM(`fixed_weighed_kg`) FROM `impact_cells` GROUP BY `event_date`, `category_id`;
