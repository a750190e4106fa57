CREATE TABLE `signoff_requests` (
	`id` integer PRIMARY KEY AUTOINCREMENT NOT NULL,
	`signoff_id` integer NOT NULL,
	`user_id` integer NOT NULL,
	`tool_id` integer NOT NULL,
	`note` text DEFAULT '' NOT NULL,
	`state` text DEFAULT 'open' NOT NULL,
	`asked_at` integer NOT NULL,
	`closed_at` integer,
	`closed_by_id` integer,
	`decline_reason` text,
	FOREIGN KEY (`signoff_id`) REFERENCES `signoffs`(`id`) ON UPDATE no action ON DELETE no action,
	FOREIGN KEY (`user_id`) REFERENCES `users`(`id`) ON UPDATE no action ON DELETE no action,
	FOREIGN KEY (`tool_id`) REFERENCES `tools`(`id`) ON UPDATE no action ON DELETE no action,
	FOREIGN KEY (`closed_by_id`) REFERENCES `users`(`id`) ON UPDATE no action ON DELETE no action,
	CONSTRAINT "signoff_requests_state_check" CHECK("signoff_requests"."state" in ('open', 'granted', 'declined')),
	CONSTRAINT "signoff_requests_closed_check" CHECK(("signoff_requests"."state" = 'open') = ("signoff_requests"."closed_at" is null))
);
--> statement-breakpoint
CREATE UNIQUE INDEX `signoff_requests_one_open` ON `signoff_requests` (`signoff_id`,`user_id`) WHERE "signoff_requests"."state" = 'open';