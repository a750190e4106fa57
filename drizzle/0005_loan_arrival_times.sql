ALTER TABLE `loans` ADD `checkout_arrived_at` integer;--> statement-breakpoint
ALTER TABLE `loans` ADD `return_arrived_at` integer;