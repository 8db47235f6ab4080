ALTER TABLE `recipes` ADD `released_dopants` varchar(40) DEFAULT '' NOT NULL;--> statement-breakpoint
ALTER TABLE `recipes` ADD `released_tube_ids` varchar(255) DEFAULT '' NOT NULL;