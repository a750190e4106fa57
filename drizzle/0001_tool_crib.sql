CREATE TABLE `job_runs` (
	`id` integer PRIMARY KEY AUTOINCREMENT NOT NULL,
	`job` text NOT NULL,
	`started_at` integer NOT NULL,
	`finished_at` integer,
	`summary` text DEFAULT '' NOT NULL,
	`error` text
);
--> statement-breakpoint
CREATE INDEX `job_runs_job_idx` ON `job_runs` (`job`,`started_at`);--> statement-breakpoint
CREATE TABLE `loan_reminders` (
	`id` integer PRIMARY KEY AUTOINCREMENT NOT NULL,
	`loan_id` integer NOT NULL,
	`day` text NOT NULL,
	`sent_at` integer NOT NULL,
	`sent_by_id` integer,
	FOREIGN KEY (`loan_id`) REFERENCES `loans`(`id`) ON UPDATE no action ON DELETE no action,
	FOREIGN KEY (`sent_by_id`) REFERENCES `users`(`id`) ON UPDATE no action ON DELETE no action
);
--> statement-breakpoint
CREATE UNIQUE INDEX `loan_reminders_one_per_day` ON `loan_reminders` (`loan_id`,`day`);--> statement-breakpoint
CREATE TABLE `settings` (
	`key` text PRIMARY KEY NOT NULL,
	`value` text NOT NULL
);
--> statement-breakpoint
CREATE TABLE `member_signoffs` (
	`id` integer PRIMARY KEY AUTOINCREMENT NOT NULL,
	`signoff_id` integer NOT NULL,
	`user_id` integer NOT NULL,
	`granted_at` integer NOT NULL,
	`granted_by_id` integer NOT NULL,
	`revoked_at` integer,
	`revoked_by_id` integer,
	FOREIGN KEY (`signoff_id`) REFERENCES `signoffs`(`id`) ON UPDATE no action ON DELETE no action,
	FOREIGN KEY (`user_id`) REFERENCES `users`(`id`) ON UPDATE no action ON DELETE no action,
	FOREIGN KEY (`granted_by_id`) REFERENCES `users`(`id`) ON UPDATE no action ON DELETE no action,
	FOREIGN KEY (`revoked_by_id`) REFERENCES `users`(`id`) ON UPDATE no action ON DELETE no action
);
--> statement-breakpoint
CREATE UNIQUE INDEX `member_signoffs_one_active` ON `member_signoffs` (`signoff_id`,`user_id`) WHERE "member_signoffs"."revoked_at" is null;--> statement-breakpoint
CREATE TABLE `signoffs` (
	`id` integer PRIMARY KEY AUTOINCREMENT NOT NULL,
	`name` text NOT NULL,
	`description` text DEFAULT '' NOT NULL,
	`created_at` integer DEFAULT (cast(unixepoch('subsec') * 1000 as integer)) NOT NULL
);
--> statement-breakpoint
CREATE UNIQUE INDEX `signoffs_name_unique` ON `signoffs` (lower("name"));--> statement-breakpoint
CREATE TABLE `holds` (
	`id` integer PRIMARY KEY AUTOINCREMENT NOT NULL,
	`tool_id` integer NOT NULL,
	`user_id` integer NOT NULL,
	`status` text DEFAULT 'waiting' NOT NULL,
	`created_at` integer NOT NULL,
	`offered_at` integer,
	`offer_expires_at` integer,
	`closed_at` integer,
	FOREIGN KEY (`tool_id`) REFERENCES `tools`(`id`) ON UPDATE no action ON DELETE no action,
	FOREIGN KEY (`user_id`) REFERENCES `users`(`id`) ON UPDATE no action ON DELETE no action
);
--> statement-breakpoint
CREATE UNIQUE INDEX `holds_one_active_per_person` ON `holds` (`tool_id`,`user_id`) WHERE "holds"."status" in ('waiting', 'offered');--> statement-breakpoint
CREATE UNIQUE INDEX `holds_one_offer_per_tool` ON `holds` (`tool_id`) WHERE "holds"."status" = 'offered';--> statement-breakpoint
CREATE INDEX `holds_tool_idx` ON `holds` (`tool_id`,`status`,`created_at`);--> statement-breakpoint
CREATE TABLE `loans` (
	`id` integer PRIMARY KEY AUTOINCREMENT NOT NULL,
	`tool_id` integer NOT NULL,
	`user_id` integer NOT NULL,
	`checked_out_at` integer NOT NULL,
	`due_at` integer NOT NULL,
	`returned_at` integer,
	`returned_by_id` integer,
	`return_condition` text,
	`return_note` text,
	`returned_count` integer,
	`shortfall` integer,
	`return_photo_id` integer,
	FOREIGN KEY (`tool_id`) REFERENCES `tools`(`id`) ON UPDATE no action ON DELETE no action,
	FOREIGN KEY (`user_id`) REFERENCES `users`(`id`) ON UPDATE no action ON DELETE no action,
	FOREIGN KEY (`returned_by_id`) REFERENCES `users`(`id`) ON UPDATE no action ON DELETE no action,
	CONSTRAINT "loans_due_check" CHECK("loans"."due_at" > "loans"."checked_out_at")
);
--> statement-breakpoint
CREATE UNIQUE INDEX `loans_one_open_per_tool` ON `loans` (`tool_id`) WHERE "loans"."returned_at" is null;--> statement-breakpoint
CREATE INDEX `loans_user_idx` ON `loans` (`user_id`,`returned_at`);--> statement-breakpoint
CREATE INDEX `loans_due_idx` ON `loans` (`returned_at`,`due_at`);--> statement-breakpoint
CREATE TABLE `photos` (
	`id` integer PRIMARY KEY AUTOINCREMENT NOT NULL,
	`tool_id` integer NOT NULL,
	`image` blob NOT NULL,
	`thumbnail` blob NOT NULL,
	`width` integer NOT NULL,
	`height` integer NOT NULL,
	`uploaded_by_id` integer,
	`created_at` integer DEFAULT (cast(unixepoch('subsec') * 1000 as integer)) NOT NULL,
	FOREIGN KEY (`tool_id`) REFERENCES `tools`(`id`) ON UPDATE no action ON DELETE no action,
	FOREIGN KEY (`uploaded_by_id`) REFERENCES `users`(`id`) ON UPDATE no action ON DELETE no action
);
--> statement-breakpoint
CREATE INDEX `photos_tool_idx` ON `photos` (`tool_id`);--> statement-breakpoint
CREATE TABLE `tool_events` (
	`id` integer PRIMARY KEY AUTOINCREMENT NOT NULL,
	`tool_id` integer NOT NULL,
	`actor_id` integer,
	`at` integer NOT NULL,
	`action` text NOT NULL,
	`from_status` text,
	`to_status` text,
	`detail` text DEFAULT '' NOT NULL,
	FOREIGN KEY (`tool_id`) REFERENCES `tools`(`id`) ON UPDATE no action ON DELETE no action,
	FOREIGN KEY (`actor_id`) REFERENCES `users`(`id`) ON UPDATE no action ON DELETE no action
);
--> statement-breakpoint
CREATE INDEX `tool_events_tool_idx` ON `tool_events` (`tool_id`,`at`);--> statement-breakpoint
CREATE TABLE `tools` (
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
	`tray_size` text,
	`tray_capacity` integer,
	`accessories` text DEFAULT '[]' NOT NULL,
	`notes` text DEFAULT '' NOT NULL,
	`created_at` integer DEFAULT (cast(unixepoch('subsec') * 1000 as integer)) NOT NULL,
	`updated_at` integer DEFAULT (cast(unixepoch('subsec') * 1000 as integer)) NOT NULL,
	FOREIGN KEY (`required_signoff_id`) REFERENCES `signoffs`(`id`) ON UPDATE no action ON DELETE no action,
	CONSTRAINT "tools_category_check" CHECK("tools"."category" in ('hand_rivet_puller', 'pneumatic_rivet_puller', 'air_drill', 'rivet_gun', 'bucking_bar', 'drill_bit', 'temporary_fastener_tray', 'deburring_tool', 'spacing_fan', 'torque_wrench', 'measuring', 'other')),
	CONSTRAINT "tools_status_check" CHECK("tools"."status" in ('available', 'on_loan', 'held', 'out_of_service', 'lost', 'retired')),
	CONSTRAINT "tools_value_check" CHECK("tools"."replacement_value_cents" >= 0),
	CONSTRAINT "tools_loan_days_check" CHECK("tools"."loan_days" is null or "tools"."loan_days" between 1 and 365),
	CONSTRAINT "tools_tray_check" CHECK("tools"."tray_capacity" is null or "tools"."tray_capacity" > 0)
);
--> statement-breakpoint
CREATE UNIQUE INDEX `tools_code_unique` ON `tools` (`code`);--> statement-breakpoint
CREATE INDEX `tools_status_idx` ON `tools` (`status`);--> statement-breakpoint
CREATE INDEX `tools_category_idx` ON `tools` (`category`);