CREATE TABLE `payment_refunds` (
	`id` integer PRIMARY KEY AUTOINCREMENT NOT NULL,
	`member_payment_id` integer NOT NULL,
	`amount_cents` integer NOT NULL,
	`at` integer NOT NULL,
	`provider_refund_id` text,
	`recorded_by_id` integer,
	`note` text DEFAULT '' NOT NULL,
	FOREIGN KEY (`member_payment_id`) REFERENCES `member_payments`(`id`) ON UPDATE no action ON DELETE no action,
	FOREIGN KEY (`recorded_by_id`) REFERENCES `users`(`id`) ON UPDATE no action ON DELETE no action,
	CONSTRAINT "payment_refunds_amount_check" CHECK("payment_refunds"."amount_cents" > 0)
);
--> statement-breakpoint
CREATE UNIQUE INDEX `payment_refunds_providerRefundId_unique` ON `payment_refunds` (`provider_refund_id`);--> statement-breakpoint
CREATE INDEX `payment_refunds_payment_idx` ON `payment_refunds` (`member_payment_id`);--> statement-breakpoint
CREATE INDEX `payment_refunds_at_idx` ON `payment_refunds` (`at`);--> statement-breakpoint
ALTER TABLE `online_payments` ADD `payment_intent_id` text;--> statement-breakpoint
CREATE UNIQUE INDEX `online_payments_paymentIntentId_unique` ON `online_payments` (`payment_intent_id`);--> statement-breakpoint
PRAGMA foreign_keys=OFF;--> statement-breakpoint
CREATE TABLE `__new_member_payments` (
	`id` integer PRIMARY KEY AUTOINCREMENT NOT NULL,
	`user_id` integer NOT NULL,
	`amount_cents` integer NOT NULL,
	`at` integer NOT NULL,
	`note` text DEFAULT '' NOT NULL,
	`recorded_by_id` integer NOT NULL,
	`method` text DEFAULT 'cash' NOT NULL,
	FOREIGN KEY (`user_id`) REFERENCES `users`(`id`) ON UPDATE no action ON DELETE no action,
	FOREIGN KEY (`recorded_by_id`) REFERENCES `users`(`id`) ON UPDATE no action ON DELETE no action,
	CONSTRAINT "member_payments_amount_check" CHECK("__new_member_payments"."amount_cents" > 0),
	CONSTRAINT "member_payments_method_check" CHECK("__new_member_payments"."method" in ('cash', 'online'))
);
--> statement-breakpoint
INSERT INTO `__new_member_payments`("id", "user_id", "amount_cents", "at", "note", "recorded_by_id", "method") SELECT "id", "user_id", "amount_cents", "at", "note", "recorded_by_id", 'cash' FROM `member_payments`;--> statement-breakpoint
DROP TABLE `member_payments`;--> statement-breakpoint
ALTER TABLE `__new_member_payments` RENAME TO `member_payments`;--> statement-breakpoint
PRAGMA foreign_keys=ON;--> statement-breakpoint
CREATE INDEX `member_payments_user_idx` ON `member_payments` (`user_id`,`at`);--> statement-breakpoint
CREATE INDEX `member_payments_at_idx` ON `member_payments` (`at`);--> statement-breakpoint
-- custom:begin
-- Payments made online before the method was kept: the ones a paid checkout points at.
UPDATE `member_payments` SET `method` = 'online'
WHERE `id` IN (SELECT `member_payment_id` FROM `online_payments` WHERE `member_payment_id` IS NOT NULL);
-- custom:end
