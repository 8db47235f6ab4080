CREATE TABLE `lots` (
	`id` int AUTO_INCREMENT NOT NULL,
	`lot_code` varchar(40) NOT NULL,
	`wafers` int NOT NULL,
	`tube_id` int NOT NULL,
	`version_id` int NOT NULL,
	`status` enum('open','in_progress','complete','scrapped') NOT NULL DEFAULT 'open',
	`notes` text NOT NULL,
	`opened_by_id` int NOT NULL,
	`created_at` datetime(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(3),
	`updated_at` datetime(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(3),
	CONSTRAINT `lots_id` PRIMARY KEY(`id`),
	CONSTRAINT `lots_code_uq` UNIQUE(`lot_code`),
	CONSTRAINT `lots_wafers_ck` CHECK(`lots`.`wafers` BETWEEN 1 AND 200)
);
--> statement-breakpoint
CREATE TABLE `outbox_messages` (
	`id` int AUTO_INCREMENT NOT NULL,
	`to_addresses` text NOT NULL,
	`subject` varchar(200) NOT NULL,
	`body_text` text NOT NULL,
	`status` enum('pending','sent','failed') NOT NULL DEFAULT 'pending',
	`attempts` int NOT NULL DEFAULT 0,
	`last_error` text,
	`related_type` varchar(40),
	`related_id` int,
	`message_id` varchar(200),
	`created_at` datetime(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(3),
	`sent_at` datetime(3),
	CONSTRAINT `outbox_messages_id` PRIMARY KEY(`id`)
);
--> statement-breakpoint
ALTER TABLE `recipe_versions` ADD `release_meaning` varchar(60);--> statement-breakpoint
ALTER TABLE `recipe_versions` ADD `review_comment` text;--> statement-breakpoint
ALTER TABLE `recipe_versions` ADD `retired_at` datetime(3);--> statement-breakpoint
ALTER TABLE `lots` ADD CONSTRAINT `lots_tube_id_tubes_id_fk` FOREIGN KEY (`tube_id`) REFERENCES `tubes`(`id`) ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `lots` ADD CONSTRAINT `lots_version_id_recipe_versions_id_fk` FOREIGN KEY (`version_id`) REFERENCES `recipe_versions`(`id`) ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `lots` ADD CONSTRAINT `lots_opened_by_id_users_id_fk` FOREIGN KEY (`opened_by_id`) REFERENCES `users`(`id`) ON DELETE no action ON UPDATE no action;--> statement-breakpoint
CREATE INDEX `lots_version_idx` ON `lots` (`version_id`);--> statement-breakpoint
CREATE INDEX `outbox_status_idx` ON `outbox_messages` (`status`);