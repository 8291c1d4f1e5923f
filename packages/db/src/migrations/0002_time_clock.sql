CREATE TABLE `pay_periods` (
	`id` bigint unsigned AUTO_INCREMENT NOT NULL,
	`kind` enum('weekly','fortnightly','semi_monthly') NOT NULL,
	`start_date` char(10) NOT NULL,
	`end_date` char(10) NOT NULL,
	`status` enum('open','approved','locked') NOT NULL DEFAULT 'open',
	`approved_by_user_id` varchar(36),
	`approved_at` datetime(3),
	`locked_by_user_id` varchar(36),
	`locked_at` datetime(3),
	`created_at` datetime(3) NOT NULL,
	`updated_at` datetime(3) NOT NULL,
	CONSTRAINT `pay_periods_id` PRIMARY KEY(`id`),
	CONSTRAINT `pay_periods_kind_start` UNIQUE(`kind`,`start_date`)
);
--> statement-breakpoint
CREATE TABLE `pay_rates` (
	`id` bigint unsigned AUTO_INCREMENT NOT NULL,
	`staff_user_id` varchar(36) NOT NULL,
	`code` varchar(32) NOT NULL,
	`hourly_rate_cents` int NOT NULL,
	`effective_from` char(10) NOT NULL,
	`created_by_user_id` varchar(36),
	`created_at` datetime(3) NOT NULL,
	CONSTRAINT `pay_rates_id` PRIMARY KEY(`id`)
);
--> statement-breakpoint
CREATE TABLE `time_entries` (
	`id` bigint unsigned AUTO_INCREMENT NOT NULL,
	`staff_user_id` varchar(36) NOT NULL,
	`booking_id` bigint unsigned,
	`kind` enum('session','shop') NOT NULL,
	`pay_rate_code` varchar(32) NOT NULL,
	`started_at` datetime(3) NOT NULL,
	`ended_at` datetime(3),
	`source` enum('clock','manual') NOT NULL,
	`note` varchar(500),
	`created_by_user_id` varchar(36),
	`created_at` datetime(3) NOT NULL,
	`updated_at` datetime(3) NOT NULL,
	CONSTRAINT `time_entries_id` PRIMARY KEY(`id`)
);
--> statement-breakpoint
CREATE TABLE `time_entry_breaks` (
	`id` bigint unsigned AUTO_INCREMENT NOT NULL,
	`time_entry_id` bigint unsigned NOT NULL,
	`started_at` datetime(3) NOT NULL,
	`ended_at` datetime(3),
	CONSTRAINT `time_entry_breaks_id` PRIMARY KEY(`id`)
);
--> statement-breakpoint
CREATE TABLE `time_entry_edits` (
	`id` bigint unsigned AUTO_INCREMENT NOT NULL,
	`time_entry_id` bigint unsigned,
	`staff_user_id` varchar(36) NOT NULL,
	`proposed` json NOT NULL,
	`reason` varchar(500) NOT NULL,
	`status` enum('pending','approved','rejected') NOT NULL DEFAULT 'pending',
	`decided_by_user_id` varchar(36),
	`decided_at` datetime(3),
	`decision_note` varchar(500),
	`created_at` datetime(3) NOT NULL,
	CONSTRAINT `time_entry_edits_id` PRIMARY KEY(`id`)
);
--> statement-breakpoint
ALTER TABLE `studio` ADD `workweek_start_hour` tinyint DEFAULT 0 NOT NULL;--> statement-breakpoint
ALTER TABLE `studio` ADD `pay_period_kind` enum('weekly','fortnightly','semi_monthly') DEFAULT 'weekly' NOT NULL;--> statement-breakpoint
ALTER TABLE `studio` ADD `pay_period_anchor` char(10) DEFAULT '2026-01-05' NOT NULL;--> statement-breakpoint
ALTER TABLE `studio` ADD `punch_rounding` enum('none','5','6','15') DEFAULT 'none' NOT NULL;--> statement-breakpoint
ALTER TABLE `studio` ADD `overtime_rules` enum('federal_weekly','daily_weekly_seventh_day') DEFAULT 'federal_weekly' NOT NULL;--> statement-breakpoint
ALTER TABLE `studio` ADD `round_regular_rate_to_cent` boolean DEFAULT false NOT NULL;--> statement-breakpoint
ALTER TABLE `studio` ADD `open_entry_limit_hours` int DEFAULT 16 NOT NULL;--> statement-breakpoint
ALTER TABLE `pay_periods` ADD CONSTRAINT `pay_periods_approved_by_user_id_user_id_fk` FOREIGN KEY (`approved_by_user_id`) REFERENCES `user`(`id`) ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `pay_periods` ADD CONSTRAINT `pay_periods_locked_by_user_id_user_id_fk` FOREIGN KEY (`locked_by_user_id`) REFERENCES `user`(`id`) ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `pay_rates` ADD CONSTRAINT `pay_rates_staff_user_id_user_id_fk` FOREIGN KEY (`staff_user_id`) REFERENCES `user`(`id`) ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `pay_rates` ADD CONSTRAINT `pay_rates_created_by_user_id_user_id_fk` FOREIGN KEY (`created_by_user_id`) REFERENCES `user`(`id`) ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `time_entries` ADD CONSTRAINT `time_entries_staff_user_id_user_id_fk` FOREIGN KEY (`staff_user_id`) REFERENCES `user`(`id`) ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `time_entries` ADD CONSTRAINT `time_entries_booking_id_bookings_id_fk` FOREIGN KEY (`booking_id`) REFERENCES `bookings`(`id`) ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `time_entries` ADD CONSTRAINT `time_entries_created_by_user_id_user_id_fk` FOREIGN KEY (`created_by_user_id`) REFERENCES `user`(`id`) ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `time_entry_breaks` ADD CONSTRAINT `time_entry_breaks_time_entry_id_time_entries_id_fk` FOREIGN KEY (`time_entry_id`) REFERENCES `time_entries`(`id`) ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `time_entry_edits` ADD CONSTRAINT `time_entry_edits_time_entry_id_time_entries_id_fk` FOREIGN KEY (`time_entry_id`) REFERENCES `time_entries`(`id`) ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `time_entry_edits` ADD CONSTRAINT `time_entry_edits_staff_user_id_user_id_fk` FOREIGN KEY (`staff_user_id`) REFERENCES `user`(`id`) ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `time_entry_edits` ADD CONSTRAINT `time_entry_edits_decided_by_user_id_user_id_fk` FOREIGN KEY (`decided_by_user_id`) REFERENCES `user`(`id`) ON DELETE no action ON UPDATE no action;--> statement-breakpoint
CREATE INDEX `pay_rates_staff_code` ON `pay_rates` (`staff_user_id`,`code`,`effective_from`);--> statement-breakpoint
CREATE INDEX `time_entries_staff_started` ON `time_entries` (`staff_user_id`,`started_at`);--> statement-breakpoint
CREATE INDEX `time_entries_started` ON `time_entries` (`started_at`);--> statement-breakpoint
CREATE INDEX `time_entry_breaks_entry` ON `time_entry_breaks` (`time_entry_id`);--> statement-breakpoint
CREATE INDEX `time_entry_edits_status` ON `time_entry_edits` (`status`);--> statement-breakpoint
CREATE INDEX `time_entry_edits_staff` ON `time_entry_edits` (`staff_user_id`);