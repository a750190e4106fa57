PRAGMA foreign_keys=OFF;--> statement-breakpoint
CREATE TABLE `__new_online_payments` (
	`id` integer PRIMARY KEY AUTOINCREMENT NOT NULL,
	`session_id` text NOT NULL,
	`event_id` text,
	`user_id` integer NOT NULL,
	`amount_cents` integer NOT NULL,
	`currency` text NOT NULL,
	`state` text DEFAULT 'open' NOT NULL,
	`member_payment_id` integer,
	`created_at` integer NOT NULL,
	`updated_at` integer NOT NULL,
	FOREIGN KEY (`user_id`) REFERENCES `users`(`id`) ON UPDATE no action ON DELETE no action,
	FOREIGN KEY (`member_payment_id`) REFERENCES `member_payments`(`id`) ON UPDATE no action ON DELETE no action,
	CONSTRAINT "online_payments_amount_check" CHECK("__new_online_payments"."amount_cents" > 0),
	CONSTRAINT "online_payments_state_check" CHECK("__new_online_payments"."state" in ('open', 'paid', 'refused', 'expired'))
);
--> statement-breakpoint
INSERT INTO `__new_online_payments`("id", "session_id", "event_id", "user_id", "amount_cents", "currency", "state", "member_payment_id", "created_at", "updated_at") SELECT "id", "session_id", "event_id", "user_id", "amount_cents", "currency", "state", "member_payment_id", "created_at", "updated_at" FROM `online_payments`;--> statement-breakpoint
DROP TABLE `online_payments`;--> statement-breakpoint
ALTER TABLE `__new_online_payments` RENAME TO `online_payments`;--> statement-breakpoint
PRAGMA foreign_keys=ON;--> statement-breakpoint
CREATE UNIQUE INDEX `online_payments_sessionId_unique` ON `online_payments` (`session_id`);--> statement-breakpoint
CREATE UNIQUE INDEX `online_payments_eventId_unique` ON `online_payments` (`event_id`);--> statement-breakpoint
CREATE INDEX `online_payments_user_idx` ON `online_payments` (`user_id`,`created_at`);