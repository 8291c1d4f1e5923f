CREATE TABLE `recorder_care_events` (
	`id` bigint unsigned AUTO_INCREMENT NOT NULL,
	`equipment_id` bigint unsigned NOT NULL,
	`kind` enum('alignment','cleaning','repair') NOT NULL,
	`done_on` char(10) NOT NULL,
	`done_by` varchar(120) NOT NULL,
	`notes` text,
	`recorded_by_user_id` varchar(36),
	`created_at` datetime(3) NOT NULL,
	CONSTRAINT `recorder_care_events_id` PRIMARY KEY(`id`)
);
--> statement-breakpoint
CREATE TABLE `reel_movements` (
	`id` bigint unsigned AUTO_INCREMENT NOT NULL,
	`reel_id` bigint unsigned NOT NULL,
	`kind` enum('check_out','check_in','release') NOT NULL,
	`person` varchar(120) NOT NULL,
	`reason` varchar(200),
	`due_back` char(10),
	`recorded_by_user_id` varchar(36),
	`at` datetime(3) NOT NULL,
	`created_at` datetime(3) NOT NULL,
	CONSTRAINT `reel_movements_id` PRIMARY KEY(`id`)
);
--> statement-breakpoint
CREATE TABLE `reel_songs` (
	`id` bigint unsigned AUTO_INCREMENT NOT NULL,
	`reel_id` bigint unsigned NOT NULL,
	`position` int NOT NULL,
	`title` varchar(120) NOT NULL,
	`start_seconds` int NOT NULL,
	`kept_takes` varchar(120),
	CONSTRAINT `reel_songs_id` PRIMARY KEY(`id`)
);
--> statement-breakpoint
CREATE TABLE `reel_tracks` (
	`reel_id` bigint unsigned NOT NULL,
	`track_no` int NOT NULL,
	`contents` varchar(120) NOT NULL,
	CONSTRAINT `reel_tracks_reel_id_track_no_pk` PRIMARY KEY(`reel_id`,`track_no`)
);
--> statement-breakpoint
CREATE TABLE `reels` (
	`id` bigint unsigned AUTO_INCREMENT NOT NULL,
	`label_id` varchar(24) NOT NULL,
	`client_account_id` bigint unsigned NOT NULL,
	`project_id` bigint unsigned,
	`tape_product_id` int,
	`track_count` int NOT NULL,
	`tape_width_mils` int NOT NULL,
	`speed_ips` double NOT NULL,
	`noise_reduction` enum('none','encoded') NOT NULL DEFAULT 'none',
	`reference_level` varchar(60),
	`recorded_on` char(10),
	`contents_note` text,
	`shelf` varchar(40),
	`status` enum('in_vault','checked_out','released') NOT NULL DEFAULT 'in_vault',
	`created_at` datetime(3) NOT NULL,
	`updated_at` datetime(3) NOT NULL,
	CONSTRAINT `reels_id` PRIMARY KEY(`id`),
	CONSTRAINT `reels_label_id_unique` UNIQUE(`label_id`)
);
--> statement-breakpoint
CREATE TABLE `storage_charges` (
	`id` bigint unsigned AUTO_INCREMENT NOT NULL,
	`client_account_id` bigint unsigned NOT NULL,
	`reel_id` bigint unsigned NOT NULL,
	`month` char(7) NOT NULL,
	`amount_cents` int NOT NULL,
	`created_at` datetime(3) NOT NULL,
	CONSTRAINT `storage_charges_id` PRIMARY KEY(`id`),
	CONSTRAINT `storage_charges_reel_month` UNIQUE(`reel_id`,`month`)
);
--> statement-breakpoint
CREATE TABLE `storage_notices` (
	`id` bigint unsigned AUTO_INCREMENT NOT NULL,
	`reel_id` bigint unsigned NOT NULL,
	`client_account_id` bigint unsigned NOT NULL,
	`fee_start` char(10) NOT NULL,
	`created_at` datetime(3) NOT NULL,
	CONSTRAINT `storage_notices_id` PRIMARY KEY(`id`),
	CONSTRAINT `storage_notices_reel_id_unique` UNIQUE(`reel_id`)
);
--> statement-breakpoint
ALTER TABLE `studio` ADD `storage_free_days` int DEFAULT 90 NOT NULL;--> statement-breakpoint
ALTER TABLE `studio` ADD `storage_monthly_fee_cents` int DEFAULT 500 NOT NULL;--> statement-breakpoint
ALTER TABLE `studio` ADD `alignment_interval_hours` int DEFAULT 100 NOT NULL;--> statement-breakpoint
ALTER TABLE `studio` ADD `cleaning_interval_hours` int DEFAULT 10 NOT NULL;--> statement-breakpoint
ALTER TABLE `recorder_care_events` ADD CONSTRAINT `recorder_care_events_equipment_id_equipment_id_fk` FOREIGN KEY (`equipment_id`) REFERENCES `equipment`(`id`) ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `recorder_care_events` ADD CONSTRAINT `recorder_care_events_recorded_by_user_id_user_id_fk` FOREIGN KEY (`recorded_by_user_id`) REFERENCES `user`(`id`) ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `reel_movements` ADD CONSTRAINT `reel_movements_reel_id_reels_id_fk` FOREIGN KEY (`reel_id`) REFERENCES `reels`(`id`) ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `reel_movements` ADD CONSTRAINT `reel_movements_recorded_by_user_id_user_id_fk` FOREIGN KEY (`recorded_by_user_id`) REFERENCES `user`(`id`) ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `reel_songs` ADD CONSTRAINT `reel_songs_reel_id_reels_id_fk` FOREIGN KEY (`reel_id`) REFERENCES `reels`(`id`) ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `reel_tracks` ADD CONSTRAINT `reel_tracks_reel_id_reels_id_fk` FOREIGN KEY (`reel_id`) REFERENCES `reels`(`id`) ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `reels` ADD CONSTRAINT `reels_client_account_id_client_accounts_id_fk` FOREIGN KEY (`client_account_id`) REFERENCES `client_accounts`(`id`) ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `reels` ADD CONSTRAINT `reels_project_id_projects_id_fk` FOREIGN KEY (`project_id`) REFERENCES `projects`(`id`) ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `storage_charges` ADD CONSTRAINT `storage_charges_client_account_id_client_accounts_id_fk` FOREIGN KEY (`client_account_id`) REFERENCES `client_accounts`(`id`) ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `storage_charges` ADD CONSTRAINT `storage_charges_reel_id_reels_id_fk` FOREIGN KEY (`reel_id`) REFERENCES `reels`(`id`) ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `storage_notices` ADD CONSTRAINT `storage_notices_reel_id_reels_id_fk` FOREIGN KEY (`reel_id`) REFERENCES `reels`(`id`) ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `storage_notices` ADD CONSTRAINT `storage_notices_client_account_id_client_accounts_id_fk` FOREIGN KEY (`client_account_id`) REFERENCES `client_accounts`(`id`) ON DELETE no action ON UPDATE no action;--> statement-breakpoint
CREATE INDEX `recorder_care_equipment_idx` ON `recorder_care_events` (`equipment_id`,`done_on`);--> statement-breakpoint
CREATE INDEX `reel_movements_reel_idx` ON `reel_movements` (`reel_id`,`at`);--> statement-breakpoint
CREATE INDEX `reel_songs_reel_idx` ON `reel_songs` (`reel_id`,`position`);--> statement-breakpoint
CREATE INDEX `reels_client_idx` ON `reels` (`client_account_id`);--> statement-breakpoint
CREATE INDEX `reels_project_idx` ON `reels` (`project_id`);--> statement-breakpoint
CREATE INDEX `storage_charges_client_idx` ON `storage_charges` (`client_account_id`,`month`);