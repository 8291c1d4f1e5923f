CREATE TABLE `scheduled_jobs` (
	`name` varchar(64) NOT NULL,
	`next_run_at` datetime(3) NOT NULL,
	`last_holder` varchar(64),
	`last_started_at` datetime(3),
	`last_finished_at` datetime(3),
	`last_result` int,
	`last_error` text,
	CONSTRAINT `scheduled_jobs_name` PRIMARY KEY(`name`)
);
--> statement-breakpoint
ALTER TABLE `email_messages` MODIFY COLUMN `status` enum('queued','sent','failed') NOT NULL;--> statement-breakpoint
ALTER TABLE `email_messages` MODIFY COLUMN `sent_at` datetime(3);--> statement-breakpoint
ALTER TABLE `email_messages` ADD `dedupe_key` varchar(191);--> statement-breakpoint
ALTER TABLE `email_messages` ADD `text_body` mediumtext;--> statement-breakpoint
ALTER TABLE `email_messages` ADD `html_body` mediumtext;--> statement-breakpoint
ALTER TABLE `email_messages` ADD `attachments` json;--> statement-breakpoint
ALTER TABLE `email_messages` ADD `attempts` int unsigned DEFAULT 0 NOT NULL;--> statement-breakpoint
ALTER TABLE `email_messages` ADD `claim_token` varchar(36);--> statement-breakpoint
ALTER TABLE `email_messages` ADD `claimed_until` datetime(3);--> statement-breakpoint
ALTER TABLE `email_messages` ADD `created_at` datetime(3);--> statement-breakpoint
UPDATE `email_messages` SET `created_at` = `sent_at`;--> statement-breakpoint
ALTER TABLE `email_messages` MODIFY COLUMN `created_at` datetime(3) NOT NULL;--> statement-breakpoint
ALTER TABLE `email_messages` ADD CONSTRAINT `email_messages_dedupe_key_uq` UNIQUE(`dedupe_key`);--> statement-breakpoint
CREATE INDEX `email_messages_queue_idx` ON `email_messages` (`status`,`claimed_until`);--> statement-breakpoint
CREATE INDEX `email_messages_claim_idx` ON `email_messages` (`claim_token`);