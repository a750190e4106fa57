PRAGMA foreign_keys=OFF;--> statement-breakpoint
CREATE TABLE `__new_tools` (
	`id` integer PRIMARY KEY AUTOINCREMENT NOT NULL,
	`code` text NOT NULL,
	`name` text NOT NULL,
	`category` text NOT NULL,
	`location` text DEFAULT '' NOT NULL,
	`replacement_value_cents` integer DEFAULT 0 NOT NULL,
	`loan_days` integer,
	`required_signoff_id` integer,
	`service_interval_days` integer,
	`last_service_at` integer,
	`status` text DEFAULT 'available' NOT NULL,
	`status_note` text,
	`drill_size` text,
	`rivet_diameter32` integer,
	`tray_size` text,
	`tray_capacity` integer,
	`accessories` text DEFAULT '[]' NOT NULL,
	`notes` text DEFAULT '' NOT NULL,
	`created_at` integer DEFAULT (cast(unixepoch('subsec') * 1000 as integer)) NOT NULL,
	`updated_at` integer DEFAULT (cast(unixepoch('subsec') * 1000 as integer)) NOT NULL,
	FOREIGN KEY (`required_signoff_id`) REFERENCES `signoffs`(`id`) ON UPDATE no action ON DELETE no action,
	CONSTRAINT "tools_category_check" CHECK("__new_tools"."category" in ('hand_rivet_puller', 'pneumatic_rivet_puller', 'air_drill', 'rivet_gun', 'bucking_bar', 'drill_bit', 'countersink_cutter', 'dimple_dies', 'temporary_fastener_tray', 'deburring_tool', 'spacing_fan', 'torque_wrench', 'measuring', 'other')),
	CONSTRAINT "tools_status_check" CHECK("__new_tools"."status" in ('available', 'on_loan', 'held', 'out_of_service', 'lost', 'retired')),
	CONSTRAINT "tools_value_check" CHECK("__new_tools"."replacement_value_cents" >= 0),
	CONSTRAINT "tools_loan_days_check" CHECK("__new_tools"."loan_days" is null or "__new_tools"."loan_days" between 1 and 365),
	CONSTRAINT "tools_tray_check" CHECK("__new_tools"."tray_capacity" is null or "__new_tools"."tray_capacity" > 0),
	CONSTRAINT "tools_rivet_size_check" CHECK(("__new_tools"."rivet_diameter32" is not null) = ("__new_tools"."category" in ('countersink_cutter', 'dimple_dies')) and ("__new_tools"."rivet_diameter32" is null or "__new_tools"."rivet_diameter32" between 1 and 16))
);
--> statement-breakpoint
INSERT INTO `__new_tools`("id", "code", "name", "category", "location", "replacement_value_cents", "loan_days", "required_signoff_id", "service_interval_days", "last_service_at", "status", "status_note", "drill_size", "rivet_diameter32", "tray_size", "tray_capacity", "accessories", "notes", "created_at", "updated_at") SELECT "id", "code", "name", "category", "location", "replacement_value_cents", "loan_days", "required_signoff_id", "service_interval_days", "last_service_at", "status", "status_note", "drill_size", "rivet_diameter32", "tray_size", "tray_capacity", "accessories", "notes", "created_at", "updated_at" FROM `tools`;--> statement-breakpoint
DROP TABLE `tools`;--> statement-breakpoint
ALTER TABLE `__new_tools` RENAME TO `tools`;--> statement-breakpoint
PRAGMA foreign_keys=ON;--> statement-breakpoint
CREATE UNIQUE INDEX `tools_code_unique` ON `tools` (`code`);--> statement-breakpoint
CREATE INDEX `tools_status_idx` ON `tools` (`status`);--> statement-breakpoint
CREATE INDEX `tools_category_idx` ON `tools` (`category`);