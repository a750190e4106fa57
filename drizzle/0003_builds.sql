CREATE TABLE `assemblies` (
	`id` integer PRIMARY KEY AUTOINCREMENT NOT NULL,
	`build_id` integer NOT NULL,
	`name` text NOT NULL,
	`status` text DEFAULT 'planned' NOT NULL,
	`planned_start` integer,
	`planned_finish` integer,
	`unit` text DEFAULT 'in' NOT NULL,
	`lines` text DEFAULT '[]' NOT NULL,
	`extra_items` text DEFAULT '[]' NOT NULL,
	`notes` text DEFAULT '' NOT NULL,
	`created_at` integer DEFAULT (cast(unixepoch('subsec') * 1000 as integer)) NOT NULL,
	`updated_at` integer DEFAULT (cast(unixepoch('subsec') * 1000 as integer)) NOT NULL,
	FOREIGN KEY (`build_id`) REFERENCES `builds`(`id`) ON UPDATE no action ON DELETE no action,
	CONSTRAINT "assemblies_status_check" CHECK("assemblies"."status" in ('planned', 'in_progress', 'done')),
	CONSTRAINT "assemblies_dates_check" CHECK("assemblies"."planned_start" is null or "assemblies"."planned_finish" is null or "assemblies"."planned_finish" >= "assemblies"."planned_start")
);
--> statement-breakpoint
CREATE INDEX `assemblies_build_idx` ON `assemblies` (`build_id`);--> statement-breakpoint
CREATE INDEX `assemblies_status_idx` ON `assemblies` (`status`);--> statement-breakpoint
CREATE TABLE `bin_alerts` (
	`id` integer PRIMARY KEY AUTOINCREMENT NOT NULL,
	`bin_id` integer NOT NULL,
	`state` text DEFAULT 'open' NOT NULL,
	`raised_at` integer NOT NULL,
	`reason` text NOT NULL,
	`on_hand_at_raise` integer NOT NULL,
	`reorder_point` integer NOT NULL,
	`safety_stock` integer NOT NULL,
	`suggested_qty` integer NOT NULL,
	`ordered_at` integer,
	`ordered_by_id` integer,
	`ordered_qty` integer,
	`expected_at` integer,
	`closed_at` integer,
	`closed_by_movement_id` integer,
	`dismissed_at` integer,
	`dismissed_by_id` integer,
	`dismiss_reason` text,
	FOREIGN KEY (`bin_id`) REFERENCES `bins`(`id`) ON UPDATE no action ON DELETE no action,
	FOREIGN KEY (`ordered_by_id`) REFERENCES `users`(`id`) ON UPDATE no action ON DELETE no action,
	FOREIGN KEY (`closed_by_movement_id`) REFERENCES `stock_movements`(`id`) ON UPDATE no action ON DELETE no action,
	FOREIGN KEY (`dismissed_by_id`) REFERENCES `users`(`id`) ON UPDATE no action ON DELETE no action,
	CONSTRAINT "bin_alerts_state_check" CHECK("bin_alerts"."state" in ('open', 'ordered', 'closed', 'dismissed'))
);
--> statement-breakpoint
CREATE UNIQUE INDEX `bin_alerts_one_active_per_bin` ON `bin_alerts` (`bin_id`) WHERE "bin_alerts"."state" in ('open', 'ordered');--> statement-breakpoint
CREATE INDEX `bin_alerts_state_idx` ON `bin_alerts` (`state`);--> statement-breakpoint
CREATE TABLE `builds` (
	`id` integer PRIMARY KEY AUTOINCREMENT NOT NULL,
	`owner_id` integer NOT NULL,
	`name` text NOT NULL,
	`description` text DEFAULT '' NOT NULL,
	`edge_floor_in` real,
	`created_at` integer DEFAULT (cast(unixepoch('subsec') * 1000 as integer)) NOT NULL,
	FOREIGN KEY (`owner_id`) REFERENCES `users`(`id`) ON UPDATE no action ON DELETE no action
);
--> statement-breakpoint
CREATE INDEX `builds_owner_idx` ON `builds` (`owner_id`);--> statement-breakpoint
ALTER TABLE `users` ADD `preferred_unit` text DEFAULT 'in' NOT NULL;