CREATE TABLE `dances` (
	`id` integer PRIMARY KEY AUTOINCREMENT NOT NULL,
	`name` text NOT NULL,
	`counts` integer NOT NULL,
	`walls` integer NOT NULL,
	`level` text NOT NULL,
	`rhythm` text DEFAULT 'other' NOT NULL,
	`meter` integer DEFAULT 4 NOT NULL,
	`bpm_min` real NOT NULL,
	`bpm_max` real NOT NULL,
	`turn` text,
	`events` text DEFAULT '[]' NOT NULL,
	`notes` text DEFAULT '' NOT NULL,
	`choreographer` text DEFAULT '' NOT NULL,
	`well_known` integer DEFAULT false NOT NULL,
	`step_sheet_key` text,
	`step_sheet_name` text,
	`created_by` integer,
	`created_at` integer DEFAULT (unixepoch('subsec') * 1000) NOT NULL,
	`updated_at` integer DEFAULT (unixepoch('subsec') * 1000) NOT NULL,
	`version` integer DEFAULT 1 NOT NULL,
	FOREIGN KEY (`created_by`) REFERENCES `users`(`id`) ON UPDATE no action ON DELETE set null,
	CONSTRAINT "dances_counts" CHECK("dances"."counts" > 0),
	CONSTRAINT "dances_walls" CHECK("dances"."walls" IN (1, 2, 4)),
	CONSTRAINT "dances_meter" CHECK("dances"."meter" IN (3, 4)),
	CONSTRAINT "dances_tempo" CHECK("dances"."bpm_min" > 0 AND "dances"."bpm_min" < "dances"."bpm_max"),
	CONSTRAINT "dances_level" CHECK("dances"."level" IN ('absolute-beginner','beginner','improver','intermediate','advanced')),
	CONSTRAINT "dances_turn" CHECK("dances"."turn" IS NULL OR "dances"."turn" IN ('left','right'))
);
--> statement-breakpoint
CREATE INDEX `dances_name_idx` ON `dances` (`name`);--> statement-breakpoint
CREATE TABLE `evenings` (
	`id` integer PRIMARY KEY AUTOINCREMENT NOT NULL,
	`title` text NOT NULL,
	`venue` text DEFAULT '' NOT NULL,
	`starts_at` integer NOT NULL,
	`ends_at` integer NOT NULL,
	`crowd` text DEFAULT 'mixed' NOT NULL,
	`notes` text DEFAULT '' NOT NULL,
	`status` text DEFAULT 'draft' NOT NULL,
	`share_token` text,
	`plan_settings` text DEFAULT '{}' NOT NULL,
	`run_order_version` integer DEFAULT 1 NOT NULL,
	`created_by` integer,
	`created_at` integer DEFAULT (unixepoch('subsec') * 1000) NOT NULL,
	`updated_at` integer DEFAULT (unixepoch('subsec') * 1000) NOT NULL,
	`version` integer DEFAULT 1 NOT NULL,
	FOREIGN KEY (`created_by`) REFERENCES `users`(`id`) ON UPDATE no action ON DELETE set null,
	CONSTRAINT "evenings_times" CHECK("evenings"."ends_at" > "evenings"."starts_at"),
	CONSTRAINT "evenings_status" CHECK("evenings"."status" IN ('draft','published')),
	CONSTRAINT "evenings_crowd" CHECK("evenings"."crowd" IN ('mostly-beginners','mixed','experienced'))
);
--> statement-breakpoint
CREATE UNIQUE INDEX `evenings_share_token_unique` ON `evenings` (`share_token`);--> statement-breakpoint
CREATE INDEX `evenings_starts_idx` ON `evenings` (`starts_at`);--> statement-breakpoint
CREATE TABLE `fits` (
	`track_id` integer NOT NULL,
	`dance_id` integer NOT NULL,
	`verdict` text NOT NULL,
	`rate` real DEFAULT 1 NOT NULL,
	`lesson_rate` real,
	`notes` text DEFAULT '' NOT NULL,
	`decided_by` integer,
	`updated_at` integer DEFAULT (unixepoch('subsec') * 1000) NOT NULL,
	PRIMARY KEY(`track_id`, `dance_id`),
	FOREIGN KEY (`track_id`) REFERENCES `tracks`(`id`) ON UPDATE no action ON DELETE cascade,
	FOREIGN KEY (`dance_id`) REFERENCES `dances`(`id`) ON UPDATE no action ON DELETE cascade,
	FOREIGN KEY (`decided_by`) REFERENCES `users`(`id`) ON UPDATE no action ON DELETE set null,
	CONSTRAINT "fits_verdict" CHECK("fits"."verdict" IN ('fits','fits-at-rate','does-not-fit')),
	CONSTRAINT "fits_rate" CHECK("fits"."rate" > 0.25 AND "fits"."rate" < 4)
);
--> statement-breakpoint
CREATE INDEX `fits_dance_idx` ON `fits` (`dance_id`);--> statement-breakpoint
CREATE TABLE `invitations` (
	`id` integer PRIMARY KEY AUTOINCREMENT NOT NULL,
	`email` text NOT NULL,
	`name` text NOT NULL,
	`roles` text NOT NULL,
	`token_hash` text NOT NULL,
	`invited_by` integer,
	`expires_at` integer NOT NULL,
	`accepted_at` integer,
	`created_at` integer DEFAULT (unixepoch('subsec') * 1000) NOT NULL,
	FOREIGN KEY (`invited_by`) REFERENCES `users`(`id`) ON UPDATE no action ON DELETE set null
);
--> statement-breakpoint
CREATE UNIQUE INDEX `invitations_token_hash_unique` ON `invitations` (`token_hash`);--> statement-breakpoint
CREATE INDEX `invitations_email` ON `invitations` (`email`);--> statement-breakpoint
CREATE TABLE `outbox` (
	`id` integer PRIMARY KEY AUTOINCREMENT NOT NULL,
	`from` text NOT NULL,
	`to` text NOT NULL,
	`subject` text NOT NULL,
	`text` text NOT NULL,
	`html` text,
	`attachments` text DEFAULT '[]' NOT NULL,
	`raw` text NOT NULL,
	`created_at` integer DEFAULT (unixepoch('subsec') * 1000) NOT NULL
);
--> statement-breakpoint
CREATE TABLE `requests` (
	`id` integer PRIMARY KEY AUTOINCREMENT NOT NULL,
	`evening_id` integer,
	`kind` text DEFAULT 'dance' NOT NULL,
	`dance_id` integer,
	`dance_name` text DEFAULT '' NOT NULL,
	`message` text DEFAULT '' NOT NULL,
	`requester_id` integer,
	`requester_name` text DEFAULT '' NOT NULL,
	`status` text DEFAULT 'open' NOT NULL,
	`created_at` integer DEFAULT (unixepoch('subsec') * 1000) NOT NULL,
	FOREIGN KEY (`evening_id`) REFERENCES `evenings`(`id`) ON UPDATE no action ON DELETE cascade,
	FOREIGN KEY (`dance_id`) REFERENCES `dances`(`id`) ON UPDATE no action ON DELETE set null,
	FOREIGN KEY (`requester_id`) REFERENCES `users`(`id`) ON UPDATE no action ON DELETE set null,
	CONSTRAINT "requests_kind" CHECK("requests"."kind" IN ('dance','slower-music')),
	CONSTRAINT "requests_status" CHECK("requests"."status" IN ('open','planned','played','declined','done'))
);
--> statement-breakpoint
CREATE INDEX `requests_evening_idx` ON `requests` (`evening_id`);--> statement-breakpoint
CREATE TABLE `run_order_entries` (
	`id` integer PRIMARY KEY AUTOINCREMENT NOT NULL,
	`evening_id` integer NOT NULL,
	`position` integer NOT NULL,
	`kind` text NOT NULL,
	`section_id` integer,
	`dance_id` integer,
	`track_id` integer,
	`rate` real DEFAULT 1 NOT NULL,
	`start_s` real DEFAULT 0 NOT NULL,
	`duration_s` real DEFAULT 0 NOT NULL,
	`locked` integer DEFAULT false NOT NULL,
	`text` text DEFAULT '' NOT NULL,
	`reasons` text DEFAULT '[]' NOT NULL,
	FOREIGN KEY (`evening_id`) REFERENCES `evenings`(`id`) ON UPDATE no action ON DELETE cascade,
	FOREIGN KEY (`section_id`) REFERENCES `sections`(`id`) ON UPDATE no action ON DELETE set null,
	FOREIGN KEY (`dance_id`) REFERENCES `dances`(`id`) ON UPDATE no action ON DELETE set null,
	FOREIGN KEY (`track_id`) REFERENCES `tracks`(`id`) ON UPDATE no action ON DELETE set null,
	CONSTRAINT "entries_kind" CHECK("run_order_entries"."kind" IN ('dance','teach','walkthrough','break','announcement')),
	CONSTRAINT "entries_rate" CHECK("run_order_entries"."rate" > 0.25 AND "run_order_entries"."rate" < 4),
	CONSTRAINT "entries_duration" CHECK("run_order_entries"."duration_s" >= 0)
);
--> statement-breakpoint
CREATE UNIQUE INDEX `entries_evening_position` ON `run_order_entries` (`evening_id`,`position`);--> statement-breakpoint
CREATE TABLE `sections` (
	`id` integer PRIMARY KEY AUTOINCREMENT NOT NULL,
	`evening_id` integer NOT NULL,
	`position` integer NOT NULL,
	`kind` text NOT NULL,
	`title` text DEFAULT '' NOT NULL,
	`starts_at` integer NOT NULL,
	`ends_at` integer NOT NULL,
	`dance_id` integer,
	`teacher_id` integer,
	FOREIGN KEY (`evening_id`) REFERENCES `evenings`(`id`) ON UPDATE no action ON DELETE cascade,
	FOREIGN KEY (`dance_id`) REFERENCES `dances`(`id`) ON UPDATE no action ON DELETE set null,
	FOREIGN KEY (`teacher_id`) REFERENCES `users`(`id`) ON UPDATE no action ON DELETE set null,
	CONSTRAINT "sections_times" CHECK("sections"."ends_at" > "sections"."starts_at"),
	CONSTRAINT "sections_kind" CHECK("sections"."kind" IN ('lesson','open-floor','request-block','break','last-dance'))
);
--> statement-breakpoint
CREATE UNIQUE INDEX `sections_evening_position` ON `sections` (`evening_id`,`position`);--> statement-breakpoint
CREATE TABLE `settings` (
	`key` text PRIMARY KEY NOT NULL,
	`value` text NOT NULL,
	`updated_at` integer DEFAULT (unixepoch('subsec') * 1000) NOT NULL
);
--> statement-breakpoint
CREATE TABLE `sign_in_failures` (
	`id` integer PRIMARY KEY AUTOINCREMENT NOT NULL,
	`key` text NOT NULL,
	`at` integer NOT NULL
);
--> statement-breakpoint
CREATE INDEX `sign_in_failures_key_at` ON `sign_in_failures` (`key`,`at`);--> statement-breakpoint
CREATE TABLE `tracks` (
	`id` integer PRIMARY KEY AUTOINCREMENT NOT NULL,
	`title` text NOT NULL,
	`artist` text DEFAULT '' NOT NULL,
	`album` text DEFAULT '' NOT NULL,
	`duration_s` real NOT NULL,
	`bpm` real,
	`raw_bpm` real,
	`bpm_source` text DEFAULT 'detected' NOT NULL,
	`offset_s` real DEFAULT 0 NOT NULL,
	`confidence` real,
	`candidates` text DEFAULT '[]' NOT NULL,
	`meter` integer DEFAULT 4 NOT NULL,
	`phrase_beats` integer DEFAULT 32 NOT NULL,
	`intro_beats` integer DEFAULT 0 NOT NULL,
	`tag_bpm` real,
	`format` text DEFAULT '' NOT NULL,
	`mime_type` text NOT NULL,
	`file_size` integer NOT NULL,
	`sha256` text NOT NULL,
	`storage_key` text NOT NULL,
	`original_name` text DEFAULT '' NOT NULL,
	`uploaded_by` integer,
	`created_at` integer DEFAULT (unixepoch('subsec') * 1000) NOT NULL,
	`updated_at` integer DEFAULT (unixepoch('subsec') * 1000) NOT NULL,
	`version` integer DEFAULT 1 NOT NULL,
	FOREIGN KEY (`uploaded_by`) REFERENCES `users`(`id`) ON UPDATE no action ON DELETE set null,
	CONSTRAINT "tracks_meter" CHECK("tracks"."meter" IN (3, 4)),
	CONSTRAINT "tracks_bpm" CHECK("tracks"."bpm" IS NULL OR ("tracks"."bpm" > 0 AND "tracks"."bpm" < 400)),
	CONSTRAINT "tracks_duration" CHECK("tracks"."duration_s" >= 0),
	CONSTRAINT "tracks_phrase" CHECK("tracks"."phrase_beats" > 0),
	CONSTRAINT "tracks_intro" CHECK("tracks"."intro_beats" >= 0),
	CONSTRAINT "tracks_size" CHECK("tracks"."file_size" >= 0),
	CONSTRAINT "tracks_source" CHECK("tracks"."bpm_source" IN ('detected','tapped','entered','tag'))
);
--> statement-breakpoint
CREATE UNIQUE INDEX `tracks_sha256_unique` ON `tracks` (`sha256`);--> statement-breakpoint
CREATE INDEX `tracks_bpm_idx` ON `tracks` (`bpm`);--> statement-breakpoint
CREATE INDEX `tracks_title_idx` ON `tracks` (`title`);--> statement-breakpoint
CREATE INDEX `tracks_created_idx` ON `tracks` (`created_at`);--> statement-breakpoint
CREATE TABLE `user_roles` (
	`user_id` integer NOT NULL,
	`role` text NOT NULL,
	PRIMARY KEY(`user_id`, `role`),
	FOREIGN KEY (`user_id`) REFERENCES `users`(`id`) ON UPDATE no action ON DELETE cascade,
	CONSTRAINT "user_roles_role" CHECK("user_roles"."role" IN ('admin','organiser','dj','instructor','dancer'))
);
--> statement-breakpoint
CREATE TABLE `users` (
	`id` integer PRIMARY KEY AUTOINCREMENT NOT NULL,
	`email` text NOT NULL,
	`name` text NOT NULL,
	`password_hash` text,
	`created_at` integer DEFAULT (unixepoch('subsec') * 1000) NOT NULL,
	`updated_at` integer DEFAULT (unixepoch('subsec') * 1000) NOT NULL,
	CONSTRAINT "users_email_shape" CHECK("users"."email" LIKE '%_@_%')
);
--> statement-breakpoint
CREATE UNIQUE INDEX `users_email_unique` ON `users` (lower("email"));