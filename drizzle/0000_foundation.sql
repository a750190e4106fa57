CREATE TABLE `account_tokens` (
	`id` integer PRIMARY KEY AUTOINCREMENT NOT NULL,
	`kind` text NOT NULL,
	`token_hash` text NOT NULL,
	`email` text NOT NULL,
	`role` text,
	`user_id` integer,
	`created_by_id` integer,
	`expires_at` integer NOT NULL,
	`used_at` integer,
	`revoked_at` integer,
	`created_at` integer DEFAULT (cast(unixepoch('subsec') * 1000 as integer)) NOT NULL,
	FOREIGN KEY (`user_id`) REFERENCES `users`(`id`) ON UPDATE no action ON DELETE no action,
	FOREIGN KEY (`created_by_id`) REFERENCES `users`(`id`) ON UPDATE no action ON DELETE no action,
	CONSTRAINT "account_tokens_kind_check" CHECK("account_tokens"."kind" in ('invitation', 'password_reset')),
	CONSTRAINT "account_tokens_shape_check" CHECK(("account_tokens"."kind" = 'invitation' and "account_tokens"."role" is not null) or ("account_tokens"."kind" = 'password_reset' and "account_tokens"."user_id" is not null))
);
--> statement-breakpoint
CREATE UNIQUE INDEX `account_tokens_hash_unique` ON `account_tokens` (`token_hash`);--> statement-breakpoint
CREATE INDEX `account_tokens_email_idx` ON `account_tokens` (`kind`,`email`);--> statement-breakpoint
CREATE TABLE `caught_mail` (
	`id` integer PRIMARY KEY AUTOINCREMENT NOT NULL,
	`message_id` text,
	`from_address` text NOT NULL,
	`to_addresses` text NOT NULL,
	`subject` text NOT NULL,
	`text_body` text NOT NULL,
	`links` text NOT NULL,
	`received_at` integer DEFAULT (cast(unixepoch('subsec') * 1000 as integer)) NOT NULL
);
--> statement-breakpoint
CREATE INDEX `caught_mail_received_idx` ON `caught_mail` (`received_at`);--> statement-breakpoint
CREATE TABLE `sessions` (
	`sid` text PRIMARY KEY NOT NULL,
	`sess` text NOT NULL,
	`expires_at` integer NOT NULL
);
--> statement-breakpoint
CREATE INDEX `sessions_expires_idx` ON `sessions` (`expires_at`);--> statement-breakpoint
CREATE TABLE `users` (
	`id` integer PRIMARY KEY AUTOINCREMENT NOT NULL,
	`email` text NOT NULL,
	`name` text NOT NULL,
	`role` text NOT NULL,
	`password_hash` text NOT NULL,
	`phone` text,
	`deactivated_at` integer,
	`created_at` integer DEFAULT (cast(unixepoch('subsec') * 1000 as integer)) NOT NULL,
	CONSTRAINT "users_role_check" CHECK("users"."role" in ('member', 'quartermaster', 'lead'))
);
--> statement-breakpoint
CREATE UNIQUE INDEX `users_email_unique` ON `users` (lower("email"));