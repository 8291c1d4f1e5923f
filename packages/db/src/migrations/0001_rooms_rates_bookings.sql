CREATE TABLE `engineer_rates` (
	`id` bigint unsigned AUTO_INCREMENT NOT NULL,
	`grade` enum('engineer','assistant') NOT NULL,
	`staff_user_id` varchar(36),
	`hourly_rate_cents` int NOT NULL,
	`effective_from` datetime(3) NOT NULL,
	`created_by_user_id` varchar(36),
	`created_at` datetime(3) NOT NULL,
	CONSTRAINT `engineer_rates_id` PRIMARY KEY(`id`)
);
--> statement-breakpoint
CREATE TABLE `equipment` (
	`id` bigint unsigned AUTO_INCREMENT NOT NULL,
	`name` varchar(120) NOT NULL,
	`kind` enum('tape_recorder','console','microphone','outboard','instrument','other') NOT NULL,
	`home_room_id` bigint unsigned,
	`track_count` int,
	`tape_width_mils` int,
	`speeds_ips` json,
	`notes` text,
	`active` boolean NOT NULL DEFAULT true,
	`created_at` datetime(3) NOT NULL,
	`updated_at` datetime(3) NOT NULL,
	CONSTRAINT `equipment_id` PRIMARY KEY(`id`)
);
--> statement-breakpoint
CREATE TABLE `rate_card_versions` (
	`id` bigint unsigned AUTO_INCREMENT NOT NULL,
	`room_id` bigint unsigned NOT NULL,
	`version` int NOT NULL,
	`effective_from` datetime(3) NOT NULL,
	`hourly_rate_cents` int NOT NULL,
	`day_rate_cents` int NOT NULL,
	`day_covers_minutes` int NOT NULL,
	`minimum_billable_minutes` int NOT NULL,
	`billing_increment_minutes` int NOT NULL,
	`after_hours_start_minute` int NOT NULL,
	`after_hours_end_minute` int NOT NULL,
	`after_hours_premium_bp` int NOT NULL,
	`weekend_premium_bp` int NOT NULL,
	`note` varchar(200),
	`created_by_user_id` varchar(36),
	`created_at` datetime(3) NOT NULL,
	CONSTRAINT `rate_card_versions_id` PRIMARY KEY(`id`),
	CONSTRAINT `rate_card_versions_room_version` UNIQUE(`room_id`,`version`)
);
--> statement-breakpoint
CREATE TABLE `rooms` (
	`id` bigint unsigned AUTO_INCREMENT NOT NULL,
	`name` varchar(60) NOT NULL,
	`description` text,
	`capacity` int NOT NULL DEFAULT 1,
	`colour` enum('rust','moss','slate','ochre','plum','teal') NOT NULL,
	`turnover_minutes` int NOT NULL DEFAULT 30,
	`position` int NOT NULL DEFAULT 0,
	`active` boolean NOT NULL DEFAULT true,
	`created_at` datetime(3) NOT NULL,
	`updated_at` datetime(3) NOT NULL,
	CONSTRAINT `rooms_id` PRIMARY KEY(`id`),
	CONSTRAINT `rooms_name_unique` UNIQUE(`name`)
);
--> statement-breakpoint
CREATE TABLE `booking_engineers` (
	`booking_id` bigint unsigned NOT NULL,
	`staff_user_id` varchar(36) NOT NULL,
	`starts_at` datetime(3) NOT NULL,
	`ends_at` datetime(3) NOT NULL,
	CONSTRAINT `booking_engineers_booking_id_staff_user_id_pk` PRIMARY KEY(`booking_id`,`staff_user_id`)
);
--> statement-breakpoint
CREATE TABLE `booking_equipment` (
	`booking_id` bigint unsigned NOT NULL,
	`equipment_id` bigint unsigned NOT NULL,
	`starts_at` datetime(3) NOT NULL,
	`ends_at` datetime(3) NOT NULL,
	CONSTRAINT `booking_equipment_booking_id_equipment_id_pk` PRIMARY KEY(`booking_id`,`equipment_id`)
);
--> statement-breakpoint
CREATE TABLE `bookings` (
	`id` bigint unsigned AUTO_INCREMENT NOT NULL,
	`room_id` bigint unsigned NOT NULL,
	`client_account_id` bigint unsigned NOT NULL,
	`project_id` bigint unsigned,
	`starts_at` datetime(3) NOT NULL,
	`ends_at` datetime(3) NOT NULL,
	`status` enum('hold','confirmed','in_session','wrapped','cancelled') NOT NULL,
	`hold_expires_at` datetime(3),
	`queued_behind_id` bigint unsigned,
	`rate_card_version_id` bigint unsigned NOT NULL,
	`quote` json NOT NULL,
	`quote_total_cents` int NOT NULL,
	`deposit_required_cents` int NOT NULL,
	`deposit_received_at` datetime(3),
	`title` varchar(120),
	`notes` text,
	`requested_by_client` boolean NOT NULL DEFAULT false,
	`cancelled_at` datetime(3),
	`cancellation_reason` varchar(200),
	`cancellation_fee_cents` int,
	`reminder_sent_at` datetime(3),
	`hold_notice_sent_at` datetime(3),
	`created_by_user_id` varchar(36),
	`created_at` datetime(3) NOT NULL,
	`updated_at` datetime(3) NOT NULL,
	CONSTRAINT `bookings_id` PRIMARY KEY(`id`)
);
--> statement-breakpoint
CREATE TABLE `calendar_feed_tokens` (
	`id` bigint unsigned AUTO_INCREMENT NOT NULL,
	`room_id` bigint unsigned,
	`staff_user_id` varchar(36),
	`token_hash` varchar(64) NOT NULL,
	`created_by_user_id` varchar(36),
	`created_at` datetime(3) NOT NULL,
	`revoked_at` datetime(3),
	CONSTRAINT `calendar_feed_tokens_id` PRIMARY KEY(`id`),
	CONSTRAINT `calendar_feed_tokens_token_hash_unique` UNIQUE(`token_hash`)
);
--> statement-breakpoint
CREATE TABLE `projects` (
	`id` bigint unsigned AUTO_INCREMENT NOT NULL,
	`client_account_id` bigint unsigned NOT NULL,
	`name` varchar(120) NOT NULL,
	`notes` text,
	`active` boolean NOT NULL DEFAULT true,
	`created_at` datetime(3) NOT NULL,
	CONSTRAINT `projects_id` PRIMARY KEY(`id`)
);
--> statement-breakpoint
ALTER TABLE `studio` ADD `hold_hours` int DEFAULT 48 NOT NULL;--> statement-breakpoint
ALTER TABLE `studio` ADD `deposit_bp` int DEFAULT 3000 NOT NULL;--> statement-breakpoint
ALTER TABLE `studio` ADD `cancellation_tiers` json NOT NULL;--> statement-breakpoint
ALTER TABLE `staff_profiles` ADD `engineer_grade` enum('engineer','assistant');--> statement-breakpoint
ALTER TABLE `engineer_rates` ADD CONSTRAINT `engineer_rates_staff_user_id_user_id_fk` FOREIGN KEY (`staff_user_id`) REFERENCES `user`(`id`) ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `engineer_rates` ADD CONSTRAINT `engineer_rates_created_by_user_id_user_id_fk` FOREIGN KEY (`created_by_user_id`) REFERENCES `user`(`id`) ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `equipment` ADD CONSTRAINT `equipment_home_room_id_rooms_id_fk` FOREIGN KEY (`home_room_id`) REFERENCES `rooms`(`id`) ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `rate_card_versions` ADD CONSTRAINT `rate_card_versions_room_id_rooms_id_fk` FOREIGN KEY (`room_id`) REFERENCES `rooms`(`id`) ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `rate_card_versions` ADD CONSTRAINT `rate_card_versions_created_by_user_id_user_id_fk` FOREIGN KEY (`created_by_user_id`) REFERENCES `user`(`id`) ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `booking_engineers` ADD CONSTRAINT `booking_engineers_booking_id_bookings_id_fk` FOREIGN KEY (`booking_id`) REFERENCES `bookings`(`id`) ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `booking_engineers` ADD CONSTRAINT `booking_engineers_staff_user_id_user_id_fk` FOREIGN KEY (`staff_user_id`) REFERENCES `user`(`id`) ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `booking_equipment` ADD CONSTRAINT `booking_equipment_booking_id_bookings_id_fk` FOREIGN KEY (`booking_id`) REFERENCES `bookings`(`id`) ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `booking_equipment` ADD CONSTRAINT `booking_equipment_equipment_id_equipment_id_fk` FOREIGN KEY (`equipment_id`) REFERENCES `equipment`(`id`) ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `bookings` ADD CONSTRAINT `bookings_room_id_rooms_id_fk` FOREIGN KEY (`room_id`) REFERENCES `rooms`(`id`) ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `bookings` ADD CONSTRAINT `bookings_client_account_id_client_accounts_id_fk` FOREIGN KEY (`client_account_id`) REFERENCES `client_accounts`(`id`) ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `bookings` ADD CONSTRAINT `bookings_project_id_projects_id_fk` FOREIGN KEY (`project_id`) REFERENCES `projects`(`id`) ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `bookings` ADD CONSTRAINT `bookings_rate_card_version_id_rate_card_versions_id_fk` FOREIGN KEY (`rate_card_version_id`) REFERENCES `rate_card_versions`(`id`) ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `bookings` ADD CONSTRAINT `bookings_created_by_user_id_user_id_fk` FOREIGN KEY (`created_by_user_id`) REFERENCES `user`(`id`) ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `calendar_feed_tokens` ADD CONSTRAINT `calendar_feed_tokens_room_id_rooms_id_fk` FOREIGN KEY (`room_id`) REFERENCES `rooms`(`id`) ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `calendar_feed_tokens` ADD CONSTRAINT `calendar_feed_tokens_staff_user_id_user_id_fk` FOREIGN KEY (`staff_user_id`) REFERENCES `user`(`id`) ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `calendar_feed_tokens` ADD CONSTRAINT `calendar_feed_tokens_created_by_user_id_user_id_fk` FOREIGN KEY (`created_by_user_id`) REFERENCES `user`(`id`) ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `projects` ADD CONSTRAINT `projects_client_account_id_client_accounts_id_fk` FOREIGN KEY (`client_account_id`) REFERENCES `client_accounts`(`id`) ON DELETE no action ON UPDATE no action;--> statement-breakpoint
CREATE INDEX `engineer_rates_grade_effective` ON `engineer_rates` (`grade`,`effective_from`);--> statement-breakpoint
CREATE INDEX `rate_card_versions_room_effective` ON `rate_card_versions` (`room_id`,`effective_from`);--> statement-breakpoint
CREATE INDEX `booking_engineers_staff_starts` ON `booking_engineers` (`staff_user_id`,`starts_at`);--> statement-breakpoint
CREATE INDEX `booking_equipment_item_starts` ON `booking_equipment` (`equipment_id`,`starts_at`);--> statement-breakpoint
CREATE INDEX `bookings_room_starts` ON `bookings` (`room_id`,`starts_at`);--> statement-breakpoint
CREATE INDEX `bookings_starts` ON `bookings` (`starts_at`);--> statement-breakpoint
CREATE INDEX `bookings_client_starts` ON `bookings` (`client_account_id`,`starts_at`);--> statement-breakpoint
CREATE INDEX `bookings_hold_expiry` ON `bookings` (`status`,`hold_expires_at`);--> statement-breakpoint
CREATE INDEX `bookings_queued_behind` ON `bookings` (`queued_behind_id`);--> statement-breakpoint
CREATE INDEX `calendar_feed_tokens_room` ON `calendar_feed_tokens` (`room_id`);--> statement-breakpoint
CREATE INDEX `calendar_feed_tokens_staff` ON `calendar_feed_tokens` (`staff_user_id`);--> statement-breakpoint
CREATE INDEX `projects_client_idx` ON `projects` (`client_account_id`);