CREATE TABLE `badges` (
	`id` integer PRIMARY KEY AUTOINCREMENT NOT NULL,
	`user_id` integer NOT NULL,
	`token_hash` text NOT NULL,
	`issued_by_id` integer NOT NULL,
	`issued_at` integer DEFAULT (cast(unixepoch('subsec') * 1000 as integer)) NOT NULL,
	`revoked_at` integer,
	FOREIGN KEY (`user_id`) REFERENCES `users`(`id`) ON UPDATE no action ON DELETE no action,
	FOREIGN KEY (`issued_by_id`) REFERENCES `users`(`id`) ON UPDATE no action ON DELETE no action
);
--> statement-breakpoint
CREATE UNIQUE INDEX `badges_hash_unique` ON `badges` (`token_hash`);--> statement-breakpoint
CREATE UNIQUE INDEX `badges_one_working_per_person` ON `badges` (`user_id`) WHERE "badges"."revoked_at" is null;--> statement-breakpoint
CREATE INDEX `badges_user_idx` ON `badges` (`user_id`);--> statement-breakpoint
CREATE TABLE `station_pin_failures` (
	`id` integer PRIMARY KEY AUTOINCREMENT NOT NULL,
	`station_id` integer NOT NULL,
	`badge_id` integer NOT NULL,
	`at` integer NOT NULL,
	FOREIGN KEY (`station_id`) REFERENCES `stations`(`id`) ON UPDATE no action ON DELETE no action,
	FOREIGN KEY (`badge_id`) REFERENCES `badges`(`id`) ON UPDATE no action ON DELETE no action
);
--> statement-breakpoint
CREATE INDEX `station_pin_failures_idx` ON `station_pin_failures` (`station_id`,`badge_id`,`at`);--> statement-breakpoint
CREATE TABLE `stations` (
	`id` integer PRIMARY KEY AUTOINCREMENT NOT NULL,
	`name` text NOT NULL,
	`token_hash` text NOT NULL,
	`enrolled_by_id` integer NOT NULL,
	`enrolled_at` integer DEFAULT (cast(unixepoch('subsec') * 1000 as integer)) NOT NULL,
	`revoked_at` integer,
	`revoked_by_id` integer,
	FOREIGN KEY (`enrolled_by_id`) REFERENCES `users`(`id`) ON UPDATE no action ON DELETE no action,
	FOREIGN KEY (`revoked_by_id`) REFERENCES `users`(`id`) ON UPDATE no action ON DELETE no action
);
--> statement-breakpoint
CREATE UNIQUE INDEX `stations_hash_unique` ON `stations` (`token_hash`);--> statement-breakpoint
ALTER TABLE `stock_movements` ADD `station_id` integer REFERENCES stations(id);--> statement-breakpoint
ALTER TABLE `tool_events` ADD `station_id` integer REFERENCES stations(id);--> statement-breakpoint
ALTER TABLE `users` ADD `pin_hash` text;