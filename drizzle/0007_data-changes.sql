-- Hand-written after drizzle-kit's CREATE TABLE (it does not write triggers): one counter per
-- table a cache holds, bumped on every row written, so a cache is dropped by the writes of the
-- data it holds and no others. Sign-in failures, invitations, password resets and the outbox
-- are not counted: no cache holds them.
CREATE TABLE `data_changes` (
	`table_name` text PRIMARY KEY NOT NULL,
	`version` integer DEFAULT 0 NOT NULL
);--> statement-breakpoint
INSERT INTO `data_changes` (`table_name`) VALUES ('users'),('user_roles'),('tracks'),('dances'),('fits'),('settings'),('evenings'),('sections'),('run_order_entries'),('requests');--> statement-breakpoint
CREATE TRIGGER `users_insert_counted` AFTER INSERT ON `users` BEGIN UPDATE `data_changes` SET `version` = `version` + 1 WHERE `table_name` = 'users'; END;--> statement-breakpoint
CREATE TRIGGER `users_update_counted` AFTER UPDATE ON `users` BEGIN UPDATE `data_changes` SET `version` = `version` + 1 WHERE `table_name` = 'users'; END;--> statement-breakpoint
CREATE TRIGGER `users_delete_counted` AFTER DELETE ON `users` BEGIN UPDATE `data_changes` SET `version` = `version` + 1 WHERE `table_name` = 'users'; END;--> statement-breakpoint
CREATE TRIGGER `user_roles_insert_counted` AFTER INSERT ON `user_roles` BEGIN UPDATE `data_changes` SET `version` = `version` + 1 WHERE `table_name` = 'user_roles'; END;--> statement-breakpoint
CREATE TRIGGER `user_roles_update_counted` AFTER UPDATE ON `user_roles` BEGIN UPDATE `data_changes` SET `version` = `version` + 1 WHERE `table_name` = 'user_roles'; END;--> statement-breakpoint
CREATE TRIGGER `user_roles_delete_counted` AFTER DELETE ON `user_roles` BEGIN UPDATE `data_changes` SET `version` = `version` + 1 WHERE `table_name` = 'user_roles'; END;--> statement-breakpoint
CREATE TRIGGER `tracks_insert_counted` AFTER INSERT ON `tracks` BEGIN UPDATE `data_changes` SET `version` = `version` + 1 WHERE `table_name` = 'tracks'; END;--> statement-breakpoint
CREATE TRIGGER `tracks_update_counted` AFTER UPDATE ON `tracks` BEGIN UPDATE `data_changes` SET `version` = `version` + 1 WHERE `table_name` = 'tracks'; END;--> statement-breakpoint
CREATE TRIGGER `tracks_delete_counted` AFTER DELETE ON `tracks` BEGIN UPDATE `data_changes` SET `version` = `version` + 1 WHERE `table_name` = 'tracks'; END;--> statement-breakpoint
CREATE TRIGGER `dances_insert_counted` AFTER INSERT ON `dances` BEGIN UPDATE `data_changes` SET `version` = `version` + 1 WHERE `table_name` = 'dances'; END;--> statement-breakpoint
CREATE TRIGGER `dances_update_counted` AFTER UPDATE ON `dances` BEGIN UPDATE `data_changes` SET `version` = `version` + 1 WHERE `table_name` = 'dances'; END;--> statement-breakpoint
CREATE TRIGGER `dances_delete_counted` AFTER DELETE ON `dances` BEGIN UPDATE `data_changes` SET `version` = `version` + 1 WHERE `table_name` = 'dances'; END;--> statement-breakpoint
CREATE TRIGGER `fits_insert_counted` AFTER INSERT ON `fits` BEGIN UPDATE `data_changes` SET `version` = `version` + 1 WHERE `table_name` = 'fits'; END;--> statement-breakpoint
CREATE TRIGGER `fits_update_counted` AFTER UPDATE ON `fits` BEGIN UPDATE `data_changes` SET `version` = `version` + 1 WHERE `table_name` = 'fits'; END;--> statement-breakpoint
CREATE TRIGGER `fits_delete_counted` AFTER DELETE ON `fits` BEGIN UPDATE `data_changes` SET `version` = `version` + 1 WHERE `table_name` = 'fits'; END;--> statement-breakpoint
CREATE TRIGGER `settings_insert_counted` AFTER INSERT ON `settings` BEGIN UPDATE `data_changes` SET `version` = `version` + 1 WHERE `table_name` = 'settings'; END;--> statement-breakpoint
CREATE TRIGGER `settings_update_counted` AFTER UPDATE ON `settings` BEGIN UPDATE `data_changes` SET `version` = `version` + 1 WHERE `table_name` = 'settings'; END;--> statement-breakpoint
CREATE TRIGGER `settings_delete_counted` AFTER DELETE ON `settings` BEGIN UPDATE `data_changes` SET `version` = `version` + 1 WHERE `table_name` = 'settings'; END;--> statement-breakpoint
CREATE TRIGGER `evenings_insert_counted` AFTER INSERT ON `evenings` BEGIN UPDATE `data_changes` SET `version` = `version` + 1 WHERE `table_name` = 'evenings'; END;--> statement-breakpoint
CREATE TRIGGER `evenings_update_counted` AFTER UPDATE ON `evenings` BEGIN UPDATE `data_changes` SET `version` = `version` + 1 WHERE `table_name` = 'evenings'; END;--> statement-breakpoint
CREATE TRIGGER `evenings_delete_counted` AFTER DELETE ON `evenings` BEGIN UPDATE `data_changes` SET `version` = `version` + 1 WHERE `table_name` = 'evenings'; END;--> statement-breakpoint
CREATE TRIGGER `sections_insert_counted` AFTER INSERT ON `sections` BEGIN UPDATE `data_changes` SET `version` = `version` + 1 WHERE `table_name` = 'sections'; END;--> statement-breakpoint
CREATE TRIGGER `sections_update_counted` AFTER UPDATE ON `sections` BEGIN UPDATE `data_changes` SET `version` = `version` + 1 WHERE `table_name` = 'sections'; END;--> statement-breakpoint
CREATE TRIGGER `sections_delete_counted` AFTER DELETE ON `sections` BEGIN UPDATE `data_changes` SET `version` = `version` + 1 WHERE `table_name` = 'sections'; END;--> statement-breakpoint
CREATE TRIGGER `run_order_entries_insert_counted` AFTER INSERT ON `run_order_entries` BEGIN UPDATE `data_changes` SET `version` = `version` + 1 WHERE `table_name` = 'run_order_entries'; END;--> statement-breakpoint
CREATE TRIGGER `run_order_entries_update_counted` AFTER UPDATE ON `run_order_entries` BEGIN UPDATE `data_changes` SET `version` = `version` + 1 WHERE `table_name` = 'run_order_entries'; END;--> statement-breakpoint
CREATE TRIGGER `run_order_entries_delete_counted` AFTER DELETE ON `run_order_entries` BEGIN UPDATE `data_changes` SET `version` = `version` + 1 WHERE `table_name` = 'run_order_entries'; END;--> statement-breakpoint
CREATE TRIGGER `requests_insert_counted` AFTER INSERT ON `requests` BEGIN UPDATE `data_changes` SET `version` = `version` + 1 WHERE `table_name` = 'requests'; END;--> statement-breakpoint
CREATE TRIGGER `requests_update_counted` AFTER UPDATE ON `requests` BEGIN UPDATE `data_changes` SET `version` = `version` + 1 WHERE `table_name` = 'requests'; END;--> statement-breakpoint
CREATE TRIGGER `requests_delete_counted` AFTER DELETE ON `requests` BEGIN UPDATE `data_changes` SET `version` = `version` + 1 WHERE `table_name` = 'requests'; END;
