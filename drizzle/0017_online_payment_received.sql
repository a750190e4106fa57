ALTER TABLE `online_payments` ADD `received_amount_cents` integer;--> statement-breakpoint
ALTER TABLE `online_payments` ADD `received_currency` text;