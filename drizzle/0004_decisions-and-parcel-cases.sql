CREATE TABLE `alternative_transitions` (
	`id` integer PRIMARY KEY AUTOINCREMENT NOT NULL,
	`alternative_id` integer NOT NULL,
	`project_id` integer NOT NULL,
	`version` integer NOT NULL,
	`action` text NOT NULL,
	`from_status` text NOT NULL,
	`to_status` text NOT NULL,
	`actor_id` integer,
	`comment` text DEFAULT '' NOT NULL,
	`created_at` integer DEFAULT (unixepoch('subsec') * 1000) NOT NULL,
	FOREIGN KEY (`alternative_id`) REFERENCES `alternatives`(`id`) ON UPDATE no action ON DELETE cascade,
	FOREIGN KEY (`project_id`) REFERENCES `projects`(`id`) ON UPDATE no action ON DELETE cascade,
	FOREIGN KEY (`actor_id`) REFERENCES `users`(`id`) ON UPDATE no action ON DELETE no action
);
--> statement-breakpoint
CREATE INDEX `alternative_transitions_alternative` ON `alternative_transitions` (`alternative_id`,`id`);--> statement-breakpoint
CREATE INDEX `alternative_transitions_project` ON `alternative_transitions` (`project_id`,`created_at`);--> statement-breakpoint
CREATE TABLE `parcel_case_events` (
	`id` integer PRIMARY KEY AUTOINCREMENT NOT NULL,
	`case_id` integer NOT NULL,
	`created_at` integer DEFAULT (unixepoch('subsec') * 1000) NOT NULL,
	`actor_id` integer,
	`kind` text NOT NULL,
	`from_value` text,
	`to_value` text,
	`note` text DEFAULT '' NOT NULL,
	`preferred_id` integer,
	FOREIGN KEY (`case_id`) REFERENCES `parcel_cases`(`id`) ON UPDATE no action ON DELETE cascade,
	FOREIGN KEY (`actor_id`) REFERENCES `users`(`id`) ON UPDATE no action ON DELETE no action,
	FOREIGN KEY (`preferred_id`) REFERENCES `preferred_alternatives`(`id`) ON UPDATE no action ON DELETE no action
);
--> statement-breakpoint
CREATE INDEX `parcel_case_events_case` ON `parcel_case_events` (`case_id`,`id`);--> statement-breakpoint
CREATE TABLE `parcel_cases` (
	`id` integer PRIMARY KEY AUTOINCREMENT NOT NULL,
	`project_id` integer NOT NULL,
	`preferred_id` integer NOT NULL,
	`parcel_id` text NOT NULL,
	`owner` text,
	`address` text,
	`parcel_area` real NOT NULL,
	`take_area` real NOT NULL,
	`easement_area` real NOT NULL,
	`remainder_area` real NOT NULL,
	`classification` text NOT NULL,
	`buildings_hit` integer NOT NULL,
	`estimated_cost` real NOT NULL,
	`station_from` real NOT NULL,
	`station_to` real NOT NULL,
	`agent_id` integer,
	`status` text DEFAULT 'not-started' NOT NULL,
	`state` text DEFAULT 'open' NOT NULL,
	`created_at` integer DEFAULT (unixepoch('subsec') * 1000) NOT NULL,
	`assigned_at` integer,
	`status_changed_at` integer NOT NULL,
	`updated_at` integer NOT NULL,
	`released_at` integer,
	FOREIGN KEY (`project_id`) REFERENCES `projects`(`id`) ON UPDATE no action ON DELETE cascade,
	FOREIGN KEY (`preferred_id`) REFERENCES `preferred_alternatives`(`id`) ON UPDATE no action ON DELETE no action,
	FOREIGN KEY (`agent_id`) REFERENCES `users`(`id`) ON UPDATE no action ON DELETE set null
);
--> statement-breakpoint
CREATE UNIQUE INDEX `parcel_cases_project_parcel` ON `parcel_cases` (`project_id`,`parcel_id`);--> statement-breakpoint
CREATE INDEX `parcel_cases_agent` ON `parcel_cases` (`agent_id`,`state`);--> statement-breakpoint
CREATE TABLE `preferred_alternatives` (
	`id` integer PRIMARY KEY AUTOINCREMENT NOT NULL,
	`project_id` integer NOT NULL,
	`alternative_id` integer NOT NULL,
	`version` integer NOT NULL,
	`take_result_id` integer,
	`summary` text NOT NULL,
	`status` text DEFAULT 'preferred' NOT NULL,
	`comment` text DEFAULT '' NOT NULL,
	`approved_by` integer,
	`created_at` integer DEFAULT (unixepoch('subsec') * 1000) NOT NULL,
	`superseded_at` integer,
	`superseded_by_id` integer,
	FOREIGN KEY (`project_id`) REFERENCES `projects`(`id`) ON UPDATE no action ON DELETE cascade,
	FOREIGN KEY (`alternative_id`) REFERENCES `alternatives`(`id`) ON UPDATE no action ON DELETE cascade,
	FOREIGN KEY (`take_result_id`) REFERENCES `take_results`(`id`) ON UPDATE no action ON DELETE no action,
	FOREIGN KEY (`approved_by`) REFERENCES `users`(`id`) ON UPDATE no action ON DELETE no action
);
--> statement-breakpoint
CREATE UNIQUE INDEX `preferred_alternatives_one_per_project` ON `preferred_alternatives` (`project_id`) WHERE status = 'preferred';--> statement-breakpoint
CREATE INDEX `preferred_alternatives_alternative` ON `preferred_alternatives` (`alternative_id`,`version`);