-- ON DELETE SET NULL written by hand: drizzle-kit's ADD COLUMN left it out, and a plain
-- reference would refuse to delete a track that answered a request.
ALTER TABLE `requests` ADD `answer` text DEFAULT '' NOT NULL;--> statement-breakpoint
ALTER TABLE `requests` ADD `answer_track_id` integer REFERENCES tracks(id) ON DELETE SET NULL;--> statement-breakpoint
ALTER TABLE `requests` ADD `answered_at` integer;
