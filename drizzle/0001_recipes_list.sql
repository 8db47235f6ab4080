ALTER TABLE `recipe_versions` ADD `summary` json;--> statement-breakpoint
ALTER TABLE `recipes` ADD `latest_version_no` int DEFAULT 1 NOT NULL;--> statement-breakpoint
ALTER TABLE `recipes` ADD `latest_state` enum('draft','in_review','released','retired') DEFAULT 'draft' NOT NULL;--> statement-breakpoint
ALTER TABLE `recipes` ADD `released_version_no` int;--> statement-breakpoint
ALTER TABLE `recipes` ADD `dopants` varchar(40) DEFAULT '' NOT NULL;--> statement-breakpoint
ALTER TABLE `recipes` ADD `tube_ids` varchar(255) DEFAULT '' NOT NULL;--> statement-breakpoint
CREATE INDEX `recipes_updated_idx` ON `recipes` (`updated_at`);