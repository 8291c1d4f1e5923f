DELETE `p` FROM `pay_rates` `p` JOIN `pay_rates` `q` ON `q`.`staff_user_id` = `p`.`staff_user_id` AND `q`.`code` = `p`.`code` AND `q`.`effective_from` = `p`.`effective_from` AND `q`.`id` > `p`.`id`;--> statement-breakpoint
ALTER TABLE `pay_rates` ADD CONSTRAINT `pay_rates_staff_code_from` UNIQUE(`staff_user_id`,`code`,`effective_from`);--> statement-breakpoint
DROP INDEX `pay_rates_staff_code` ON `pay_rates`;--> statement-breakpoint
DELETE `p` FROM `engineer_rates` `p` JOIN `engineer_rates` `q` ON `q`.`grade` = `p`.`grade` AND `q`.`staff_user_id` <=> `p`.`staff_user_id` AND `q`.`effective_from` = `p`.`effective_from` AND `q`.`id` > `p`.`id`;--> statement-breakpoint
ALTER TABLE `engineer_rates` ADD `staff_key` varchar(36) GENERATED ALWAYS AS (coalesce(`staff_user_id`, '')) STORED;--> statement-breakpoint
ALTER TABLE `engineer_rates` ADD CONSTRAINT `engineer_rates_grade_staff_from` UNIQUE(`grade`,`staff_key`,`effective_from`);--> statement-breakpoint
ALTER TABLE `time_entry_edits` ADD `proposed_by_user_id` varchar(36);--> statement-breakpoint
UPDATE `time_entry_edits` SET `proposed_by_user_id` = `staff_user_id`;--> statement-breakpoint
UPDATE `time_entry_edits` `e` JOIN `time_entries` `t` ON `t`.`id` = `e`.`time_entry_id` SET `e`.`staff_user_id` = `t`.`staff_user_id`;--> statement-breakpoint
ALTER TABLE `time_entry_edits` ADD `result_entry_id` bigint unsigned;--> statement-breakpoint
UPDATE `time_entry_edits` SET `result_entry_id` = `time_entry_id` WHERE `status` = 'approved';--> statement-breakpoint
ALTER TABLE `time_entry_edits` ADD `self_approved` boolean DEFAULT false NOT NULL;--> statement-breakpoint
ALTER TABLE `time_entry_edits` ADD CONSTRAINT `time_entry_edits_proposed_by_user_id_user_id_fk` FOREIGN KEY (`proposed_by_user_id`) REFERENCES `user`(`id`) ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `time_entry_edits` ADD CONSTRAINT `time_entry_edits_result_entry_id_time_entries_id_fk` FOREIGN KEY (`result_entry_id`) REFERENCES `time_entries`(`id`) ON DELETE no action ON UPDATE no action;
