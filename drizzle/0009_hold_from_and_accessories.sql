CREATE TABLE `missing_accessories` (
	`id` integer PRIMARY KEY AUTOINCREMENT NOT NULL,
	`tool_id` integer NOT NULL,
	`loan_id` integer NOT NULL,
	`accessory` text NOT NULL,
	`reported_at` integer NOT NULL,
	`resolved_at` integer,
	`resolved_by_id` integer,
	`resolution` text,
	FOREIGN KEY (`tool_id`) REFERENCES `tools`(`id`) ON UPDATE no action ON DELETE no action,
	FOREIGN KEY (`loan_id`) REFERENCES `loans`(`id`) ON UPDATE no action ON DELETE no action,
	FOREIGN KEY (`resolved_by_id`) REFERENCES `users`(`id`) ON UPDATE no action ON DELETE no action,
	CONSTRAINT "missing_accessories_resolution_check" CHECK(("missing_accessories"."resolved_at" is null) = ("missing_accessories"."resolution" is null))
);
--> statement-breakpoint
CREATE UNIQUE INDEX `missing_accessories_one_open` ON `missing_accessories` (`tool_id`,`accessory`) WHERE "missing_accessories"."resolved_at" is null;--> statement-breakpoint
ALTER TABLE `holds` ADD `starts_at` integer;--> statement-breakpoint
ALTER TABLE `loans` ADD `accessories_out` text;