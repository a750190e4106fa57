CREATE TABLE `outbox_mail` (
	`id` integer PRIMARY KEY AUTOINCREMENT NOT NULL,
	`to_address` text NOT NULL,
	`subject` text NOT NULL,
	`text_body` text NOT NULL,
	`state` text DEFAULT 'waiting' NOT NULL,
	`attempts` integer DEFAULT 0 NOT NULL,
	`next_attempt_at` integer NOT NULL,
	`last_error` text,
	`created_at` integer NOT NULL,
	`sent_at` integer,
	CONSTRAINT "outbox_mail_state_check" CHECK("outbox_mail"."state" in ('waiting', 'sent', 'failed')),
	CONSTRAINT "outbox_mail_attempts_check" CHECK("outbox_mail"."attempts" >= 0),
	CONSTRAINT "outbox_mail_sent_check" CHECK(("outbox_mail"."state" = 'sent') = ("outbox_mail"."sent_at" is not null))
);
--> statement-breakpoint
CREATE INDEX `outbox_mail_due_idx` ON `outbox_mail` (`state`,`next_attempt_at`);--> statement-breakpoint
CREATE INDEX `outbox_mail_to_idx` ON `outbox_mail` (`to_address`);--> statement-breakpoint
-- custom:begin
-- Mail caught before the outbox existed stays listed on Sent mail, as sent.
INSERT INTO `outbox_mail` (`to_address`, `subject`, `text_body`, `state`, `attempts`, `next_attempt_at`, `created_at`, `sent_at`)
SELECT coalesce(json_extract(`to_addresses`, '$[0]'), ''), `subject`, `text_body`, 'sent', 0, `received_at`, `received_at`, `received_at`
FROM `caught_mail` ORDER BY `id`;
-- custom:end
