ALTER TABLE `staff_profiles` ADD `lock_version` int unsigned DEFAULT 0 NOT NULL;--> statement-breakpoint
ALTER TABLE `equipment` ADD `lock_version` int unsigned DEFAULT 0 NOT NULL;--> statement-breakpoint
ALTER TABLE `rooms` ADD `lock_version` int unsigned DEFAULT 0 NOT NULL;