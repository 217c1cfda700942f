CREATE INDEX `tracks_title_nocase_id_idx` ON `tracks` ("title" COLLATE NOCASE,`id`);--> statement-breakpoint
CREATE INDEX `tracks_artist_nocase_id_idx` ON `tracks` ("artist" COLLATE NOCASE,`id`);