CREATE TABLE `buildings` (
	`id` integer PRIMARY KEY AUTOINCREMENT NOT NULL,
	`layer_id` integer NOT NULL,
	`parcel_id` text,
	`value` real,
	`attributes` text NOT NULL,
	`geometry` text NOT NULL,
	`geometry_wgs84` text NOT NULL,
	`area` real NOT NULL,
	`min_x` real NOT NULL,
	`min_y` real NOT NULL,
	`max_x` real NOT NULL,
	`max_y` real NOT NULL,
	FOREIGN KEY (`layer_id`) REFERENCES `layers`(`id`) ON UPDATE no action ON DELETE cascade
);
--> statement-breakpoint
CREATE INDEX `buildings_layer` ON `buildings` (`layer_id`);--> statement-breakpoint
CREATE TABLE `fabric_changes` (
	`project_id` integer PRIMARY KEY NOT NULL,
	`changed_at` integer NOT NULL,
	`layer_id` integer,
	FOREIGN KEY (`project_id`) REFERENCES `projects`(`id`) ON UPDATE no action ON DELETE cascade,
	FOREIGN KEY (`layer_id`) REFERENCES `layers`(`id`) ON UPDATE no action ON DELETE set null
);
--> statement-breakpoint
CREATE TABLE `layers` (
	`id` integer PRIMARY KEY AUTOINCREMENT NOT NULL,
	`project_id` integer NOT NULL,
	`kind` text NOT NULL,
	`name` text NOT NULL,
	`source_file_name` text NOT NULL,
	`format` text NOT NULL,
	`source_crs` text NOT NULL,
	`field_mapping` text NOT NULL,
	`feature_count` integer NOT NULL,
	`bbox` text NOT NULL,
	`status` text DEFAULT 'active' NOT NULL,
	`replaced_by_layer_id` integer,
	`created_by` integer,
	`created_at` integer DEFAULT (unixepoch('subsec') * 1000) NOT NULL,
	`replaced_at` integer,
	FOREIGN KEY (`project_id`) REFERENCES `projects`(`id`) ON UPDATE no action ON DELETE cascade,
	FOREIGN KEY (`created_by`) REFERENCES `users`(`id`) ON UPDATE no action ON DELETE no action
);
--> statement-breakpoint
CREATE INDEX `layers_project` ON `layers` (`project_id`,`kind`,`status`);--> statement-breakpoint
CREATE TABLE `parcels` (
	`id` integer PRIMARY KEY AUTOINCREMENT NOT NULL,
	`layer_id` integer NOT NULL,
	`parcel_id` text NOT NULL,
	`owner` text,
	`address` text,
	`land_use` text,
	`land_value` real,
	`land_value_basis` text DEFAULT 'total' NOT NULL,
	`attributes` text NOT NULL,
	`geometry` text NOT NULL,
	`geometry_wgs84` text NOT NULL,
	`area` real NOT NULL,
	`min_x` real NOT NULL,
	`min_y` real NOT NULL,
	`max_x` real NOT NULL,
	`max_y` real NOT NULL,
	FOREIGN KEY (`layer_id`) REFERENCES `layers`(`id`) ON UPDATE no action ON DELETE cascade
);
--> statement-breakpoint
CREATE UNIQUE INDEX `parcels_layer_parcel_id` ON `parcels` (`layer_id`,`parcel_id`);