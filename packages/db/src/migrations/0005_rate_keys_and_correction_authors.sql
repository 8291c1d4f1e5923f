ALTER TABLE `pay_rates` ADD CONSTRAINT `pay_rates_staff_code_from` UNIQUE(`staff_user_id`,`code`,`effective_from`);--> statement-breakpoint
DROP INDEX `pay_rates_staff_code` ON `pay_rates`;--> statement-breakpoint
ALTER TABLE `engineer_rates` ADD `staff_key` varchar(36) GENERATED ALWAYS AS (coalesce(`staff_user_id`, '')) STORED;--> statement-breakpoint
ALTER TABLE `engineer_rates` ADD CONSTRAINT `engineer_rates_grade_staff_from` UNIQUE(`grade`,`staff_key`,`effective_from`);--> statement-breakpoint
ALTER TABLE `time_entry_edits` ADD `proposed_by_user_id` varchar(36);--> statement-breakpoint
UPDATE `time_entry_edits` SET `proposed_by_user_id` = `staff_user_id`;--> statement-breakpoint
ALTER TABLE `time_entry_edits` ADD `self_approved` boolean DEFAULT false NOT NULL;--> statement-breakpoint
ALTER TABLE `time_entry_edits` ADD CONSTRAINT `time_entry_edits_proposed_by_user_id_user_id_fk` FOREIGN KEY (`proposed_by_user_id`) REFERENCES `user`(`id`) ON DELETE no action ON UPDATE no action;
