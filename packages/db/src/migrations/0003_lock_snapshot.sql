ALTER TABLE `pay_periods` ADD `locked_settings` json;--> statement-breakpoint
ALTER TABLE `pay_periods` ADD `locked_pay_rates` json;