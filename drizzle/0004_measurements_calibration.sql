CREATE TABLE `calibrations` (
	`id` int AUTO_INCREMENT NOT NULL,
	`tube_id` int NOT NULL,
	`factor` double NOT NULL,
	`ln_factor_std_err` double NOT NULL,
	`rms_log_error_before` double NOT NULL,
	`rms_log_error_after` double NOT NULL,
	`points` int NOT NULL,
	`data` json NOT NULL,
	`note` text NOT NULL,
	`fitted_by_id` int NOT NULL,
	`created_at` datetime(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(3),
	CONSTRAINT `calibrations_id` PRIMARY KEY(`id`)
);
--> statement-breakpoint
CREATE TABLE `measurements` (
	`id` int AUTO_INCREMENT NOT NULL,
	`lot_id` int NOT NULL,
	`kind` enum('profile','sheet_resistance') NOT NULL,
	`method` varchar(40) NOT NULL,
	`file_name` varchar(200) NOT NULL,
	`points` json NOT NULL,
	`summary` json NOT NULL,
	`notes` text NOT NULL,
	`uploaded_by_id` int NOT NULL,
	`created_at` datetime(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(3),
	CONSTRAINT `measurements_id` PRIMARY KEY(`id`)
);
--> statement-breakpoint
ALTER TABLE `calibrations` ADD CONSTRAINT `calibrations_tube_id_tubes_id_fk` FOREIGN KEY (`tube_id`) REFERENCES `tubes`(`id`) ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `calibrations` ADD CONSTRAINT `calibrations_fitted_by_id_users_id_fk` FOREIGN KEY (`fitted_by_id`) REFERENCES `users`(`id`) ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `measurements` ADD CONSTRAINT `measurements_lot_id_lots_id_fk` FOREIGN KEY (`lot_id`) REFERENCES `lots`(`id`) ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `measurements` ADD CONSTRAINT `measurements_uploaded_by_id_users_id_fk` FOREIGN KEY (`uploaded_by_id`) REFERENCES `users`(`id`) ON DELETE no action ON UPDATE no action;--> statement-breakpoint
CREATE INDEX `calibrations_tube_idx` ON `calibrations` (`tube_id`);--> statement-breakpoint
CREATE INDEX `measurements_lot_idx` ON `measurements` (`lot_id`);