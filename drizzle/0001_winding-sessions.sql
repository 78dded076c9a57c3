CREATE TABLE `winding_checklists` (
	`session_id` text PRIMARY KEY NOT NULL,
	`base_end_fastened` integer DEFAULT false NOT NULL,
	`top_end_fastened` integer DEFAULT false NOT NULL,
	`coating` text,
	`coats` integer,
	`drying_hours` real,
	`notes` text,
	`updated_at` integer DEFAULT (cast(unixepoch('subsecond') * 1000 as integer)) NOT NULL,
	FOREIGN KEY (`session_id`) REFERENCES `winding_sessions`(`id`) ON UPDATE no action ON DELETE cascade
);
--> statement-breakpoint
CREATE TABLE `winding_pauses` (
	`id` text PRIMARY KEY NOT NULL,
	`session_id` text NOT NULL,
	`reason` text NOT NULL,
	`note` text,
	`started_at` integer NOT NULL,
	`ended_at` integer,
	FOREIGN KEY (`session_id`) REFERENCES `winding_sessions`(`id`) ON UPDATE no action ON DELETE cascade
);
--> statement-breakpoint
CREATE INDEX `winding_pauses_session_idx` ON `winding_pauses` (`session_id`);--> statement-breakpoint
CREATE TABLE `winding_readings` (
	`id` text PRIMARY KEY NOT NULL,
	`session_id` text NOT NULL,
	`at` integer NOT NULL,
	`counter` integer NOT NULL,
	`height` real,
	`datum` text,
	`created_at` integer DEFAULT (cast(unixepoch('subsecond') * 1000 as integer)) NOT NULL,
	FOREIGN KEY (`session_id`) REFERENCES `winding_sessions`(`id`) ON UPDATE no action ON DELETE cascade
);
--> statement-breakpoint
CREATE INDEX `winding_readings_session_idx` ON `winding_readings` (`session_id`,`at`);--> statement-breakpoint
CREATE TABLE `winding_sessions` (
	`id` text PRIMARY KEY NOT NULL,
	`design_id` text NOT NULL,
	`revision` integer NOT NULL,
	`started_by` text,
	`status` text NOT NULL,
	`rpm` real NOT NULL,
	`spool_length` real,
	`start_offset` real NOT NULL,
	`form_length` real NOT NULL,
	`planned_turns` integer NOT NULL,
	`pitch` real NOT NULL,
	`pitch_source` text NOT NULL,
	`winding_diameter` real NOT NULL,
	`insulated_diameter` real NOT NULL,
	`planned_length` real NOT NULL,
	`planned_wire` real NOT NULL,
	`started_at` integer NOT NULL,
	`finished_at` integer,
	`wound_turns` integer,
	`winding_length` real,
	`notes` text,
	`adopted_revision` integer,
	`created_at` integer DEFAULT (cast(unixepoch('subsecond') * 1000 as integer)) NOT NULL,
	FOREIGN KEY (`design_id`) REFERENCES `designs`(`id`) ON UPDATE no action ON DELETE cascade,
	FOREIGN KEY (`started_by`) REFERENCES `user`(`id`) ON UPDATE no action ON DELETE set null
);
--> statement-breakpoint
CREATE INDEX `winding_sessions_design_idx` ON `winding_sessions` (`design_id`);