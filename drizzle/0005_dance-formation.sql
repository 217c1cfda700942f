-- Written by hand in place of drizzle-kit's table rebuild: its copy selected a column the old
-- table lacks, and DROP TABLE inside the migrator's transaction (where PRAGMA foreign_keys=OFF
-- does nothing) would cascade-delete every fit. A column CHECK holds the same list.
ALTER TABLE `dances` ADD `formation` text DEFAULT 'line' NOT NULL CHECK (`formation` IN ('line','partner','circle'));
