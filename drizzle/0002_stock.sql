CREATE TABLE `bins` (
	`id` integer PRIMARY KEY AUTOINCREMENT NOT NULL,
	`code` text NOT NULL,
	`kind` text NOT NULL,
	`name` text DEFAULT '' NOT NULL,
	`unit` text DEFAULT 'each' NOT NULL,
	`pack_size` integer DEFAULT 1 NOT NULL,
	`unit_cost_e_4` integer DEFAULT 0 NOT NULL,
	`supplier` text DEFAULT '' NOT NULL,
	`supplier_part` text DEFAULT '' NOT NULL,
	`lead_time_days` integer DEFAULT 14 NOT NULL,
	`reorder_point` integer DEFAULT 0 NOT NULL,
	`reorder_qty` integer DEFAULT 0 NOT NULL,
	`location` text DEFAULT '' NOT NULL,
	`notes` text DEFAULT '' NOT NULL,
	`head` text,
	`material` text,
	`stem_material` text,
	`diameter32` integer,
	`grip16` integer,
	`length16` real,
	`drill_size` text,
	`hole_drill` text,
	`on_hand` integer DEFAULT 0 NOT NULL,
	`created_at` integer DEFAULT (cast(unixepoch('subsec') * 1000 as integer)) NOT NULL,
	`updated_at` integer DEFAULT (cast(unixepoch('subsec') * 1000 as integer)) NOT NULL,
	CONSTRAINT "bins_kind_check" CHECK("bins"."kind" in ('blind_structural', 'blind_general', 'solid_rivet', 'screw', 'nut', 'washer', 'drill_bit', 'deburring_blade', 'sealant_primer', 'other')),
	CONSTRAINT "bins_on_hand_check" CHECK("bins"."on_hand" >= 0),
	CONSTRAINT "bins_pack_check" CHECK("bins"."pack_size" >= 1),
	CONSTRAINT "bins_cost_check" CHECK("bins"."unit_cost_e_4" >= 0)
);
--> statement-breakpoint
CREATE UNIQUE INDEX `bins_code_unique` ON `bins` (`code`);--> statement-breakpoint
CREATE INDEX `bins_kind_idx` ON `bins` (`kind`);--> statement-breakpoint
CREATE TABLE `member_payments` (
	`id` integer PRIMARY KEY AUTOINCREMENT NOT NULL,
	`user_id` integer NOT NULL,
	`amount_cents` integer NOT NULL,
	`at` integer NOT NULL,
	`note` text DEFAULT '' NOT NULL,
	`recorded_by_id` integer NOT NULL,
	FOREIGN KEY (`user_id`) REFERENCES `users`(`id`) ON UPDATE no action ON DELETE no action,
	FOREIGN KEY (`recorded_by_id`) REFERENCES `users`(`id`) ON UPDATE no action ON DELETE no action,
	CONSTRAINT "member_payments_amount_check" CHECK("member_payments"."amount_cents" > 0)
);
--> statement-breakpoint
CREATE INDEX `member_payments_user_idx` ON `member_payments` (`user_id`,`at`);--> statement-breakpoint
CREATE TABLE `stock_movements` (
	`id` integer PRIMARY KEY AUTOINCREMENT NOT NULL,
	`bin_id` integer NOT NULL,
	`kind` text NOT NULL,
	`quantity` integer NOT NULL,
	`balance_after` integer NOT NULL,
	`unit_cost_e_4` integer NOT NULL,
	`at` integer NOT NULL,
	`actor_id` integer NOT NULL,
	`member_id` integer,
	`assembly_id` integer,
	`note` text DEFAULT '' NOT NULL,
	`reverses_id` integer,
	`paired_id` integer,
	`slip_id` integer,
	FOREIGN KEY (`bin_id`) REFERENCES `bins`(`id`) ON UPDATE no action ON DELETE no action,
	FOREIGN KEY (`actor_id`) REFERENCES `users`(`id`) ON UPDATE no action ON DELETE no action,
	FOREIGN KEY (`member_id`) REFERENCES `users`(`id`) ON UPDATE no action ON DELETE no action,
	FOREIGN KEY (`reverses_id`) REFERENCES `stock_movements`(`id`) ON UPDATE no action ON DELETE no action,
	FOREIGN KEY (`slip_id`) REFERENCES `stock_slips`(`id`) ON UPDATE no action ON DELETE no action,
	CONSTRAINT "stock_movements_kind_check" CHECK("stock_movements"."kind" in ('receive', 'draw', 'return_unused', 'count', 'transfer_out', 'transfer_in', 'write_off', 'reversal')),
	CONSTRAINT "stock_movements_balance_check" CHECK("stock_movements"."balance_after" >= 0),
	CONSTRAINT "stock_movements_quantity_check" CHECK("stock_movements"."quantity" <> 0 or "stock_movements"."kind" = 'count')
);
--> statement-breakpoint
CREATE INDEX `stock_movements_bin_idx` ON `stock_movements` (`bin_id`,`at`);--> statement-breakpoint
CREATE INDEX `stock_movements_member_idx` ON `stock_movements` (`member_id`,`at`);--> statement-breakpoint
CREATE INDEX `stock_movements_at_idx` ON `stock_movements` (`at`);--> statement-breakpoint
CREATE UNIQUE INDEX `stock_movements_reversed_once` ON `stock_movements` (`reverses_id`) WHERE "stock_movements"."reverses_id" is not null;--> statement-breakpoint
CREATE TABLE `stock_slips` (
	`id` integer PRIMARY KEY AUTOINCREMENT NOT NULL,
	`content_type` text NOT NULL,
	`filename` text NOT NULL,
	`bytes` blob NOT NULL,
	`uploaded_by_id` integer NOT NULL,
	`created_at` integer DEFAULT (cast(unixepoch('subsec') * 1000 as integer)) NOT NULL,
	FOREIGN KEY (`uploaded_by_id`) REFERENCES `users`(`id`) ON UPDATE no action ON DELETE no action
);
--> statement-breakpoint
CREATE TRIGGER `stock_movements_no_update` BEFORE UPDATE ON `stock_movements` BEGIN SELECT RAISE(ABORT, 'stock movements are append-only: write a reversing entry instead'); END;--> statement-breakpoint
CREATE TRIGGER `stock_movements_no_delete` BEFORE DELETE ON `stock_movements` BEGIN SELECT RAISE(ABORT, 'stock movements are append-only: write a reversing entry instead'); END;
