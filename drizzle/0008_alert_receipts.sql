ALTER TABLE `bin_alerts` ADD `received_qty` integer DEFAULT 0 NOT NULL;--> statement-breakpoint
ALTER TABLE `bin_alerts` ADD `closed_by_id` integer REFERENCES users(id);