CREATE TABLE `alternative_versions` (
	`alternative_id` integer NOT NULL,
	`version` integer NOT NULL,
	`inputs` text NOT NULL,
	`saved_by` integer,
	`created_at` integer DEFAULT (unixepoch('subsec') * 1000) NOT NULL,
	PRIMARY KEY(`alternative_id`, `version`),
	FOREIGN KEY (`alternative_id`) REFERENCES `alternatives`(`id`) ON UPDATE no action ON DELETE cascade,
	FOREIGN KEY (`saved_by`) REFERENCES `users`(`id`) ON UPDATE no action ON DELETE no action
);
--> statement-breakpoint
CREATE TABLE `alternatives` (
	`id` integer PRIMARY KEY AUTOINCREMENT NOT NULL,
	`project_id` integer NOT NULL,
	`name` text NOT NULL,
	`description` text DEFAULT '' NOT NULL,
	`design_speed` real NOT NULL,
	`speed_unit` text NOT NULL,
	`emax_percent` integer NOT NULL,
	`alignment` text NOT NULL,
	`corridor` text NOT NULL,
	`rules` text NOT NULL,
	`accepted_checks` text NOT NULL,
	`colour` text NOT NULL,
	`status` text DEFAULT 'draft' NOT NULL,
	`version` integer DEFAULT 1 NOT NULL,
	`created_by` integer,
	`created_at` integer DEFAULT (unixepoch('subsec') * 1000) NOT NULL,
	`updated_by` integer,
	`updated_at` integer NOT NULL,
	FOREIGN KEY (`project_id`) REFERENCES `projects`(`id`) ON UPDATE no action ON DELETE cascade,
	FOREIGN KEY (`created_by`) REFERENCES `users`(`id`) ON UPDATE no action ON DELETE no action,
	FOREIGN KEY (`updated_by`) REFERENCES `users`(`id`) ON UPDATE no action ON DELETE no action
);
--> statement-breakpoint
CREATE INDEX `alternatives_project` ON `alternatives` (`project_id`);--> statement-breakpoint
CREATE TABLE `take_results` (
	`id` integer PRIMARY KEY AUTOINCREMENT NOT NULL,
	`alternative_id` integer NOT NULL,
	`version` integer NOT NULL,
	`input_hash` text NOT NULL,
	`summary` text NOT NULL,
	`parcels` text NOT NULL,
	`created_at` integer DEFAULT (unixepoch('subsec') * 1000) NOT NULL,
	FOREIGN KEY (`alternative_id`) REFERENCES `alternatives`(`id`) ON UPDATE no action ON DELETE cascade
);
--> statement-breakpoint
CREATE UNIQUE INDEX `take_results_alternative_hash` ON `take_results` (`alternative_id`,`input_hash`);--> statement-breakpoint
CREATE INDEX `take_results_alternative_version` ON `take_results` (`alternative_id`,`version`);--> statement-breakpoint
ALTER TABLE `projects` ADD `take_rules` text;