ALTER TABLE `rate_card_versions` ADD `lockout_day_rate_cents` int;--> statement-breakpoint
ALTER TABLE `rate_card_versions` ADD `lockout_weekend_premium` boolean DEFAULT false NOT NULL;--> statement-breakpoint
ALTER TABLE `bookings` ADD `lockout` boolean DEFAULT false NOT NULL;