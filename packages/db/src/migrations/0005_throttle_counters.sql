CREATE TABLE `throttle_counters` (
	`key` varchar(191) NOT NULL,
	`hits` int unsigned NOT NULL,
	`window_started_at` datetime(3) NOT NULL,
	`blocked_until` datetime(3),
	CONSTRAINT `throttle_counters_key` PRIMARY KEY(`key`)
);
--> statement-breakpoint
CREATE INDEX `throttle_counters_window_idx` ON `throttle_counters` (`window_started_at`);