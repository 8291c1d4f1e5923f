CREATE TABLE `tape_low_stock_alerts` (
	`id` bigint unsigned AUTO_INCREMENT NOT NULL,
	`product_id` bigint unsigned NOT NULL,
	`low_since` datetime(3) NOT NULL,
	`on_hand` int unsigned NOT NULL,
	`created_at` datetime(3) NOT NULL,
	CONSTRAINT `tape_low_stock_alerts_id` PRIMARY KEY(`id`),
	CONSTRAINT `tape_low_stock_alerts_crossing_uq` UNIQUE(`product_id`,`low_since`)
);
--> statement-breakpoint
CREATE TABLE `tape_movements` (
	`id` bigint unsigned AUTO_INCREMENT NOT NULL,
	`product_id` bigint unsigned NOT NULL,
	`kind` enum('receipt','sale','return','adjustment','write_off') NOT NULL,
	`quantity` int NOT NULL,
	`unit_cost_cents` int unsigned NOT NULL,
	`value_change_cents` bigint NOT NULL,
	`cost_of_goods_cents` bigint unsigned,
	`unit_price_cents` int unsigned,
	`amount_cents` bigint unsigned,
	`description` varchar(200) NOT NULL,
	`client_account_id` bigint unsigned,
	`project_id` bigint unsigned,
	`booking_id` bigint unsigned,
	`supplier` varchar(120),
	`received_on` date,
	`receipt_original_name` varchar(255),
	`receipt_stored_name` varchar(80),
	`receipt_content_type` varchar(40),
	`receipt_bytes` int unsigned,
	`reason` varchar(500),
	`on_hand_after` int unsigned NOT NULL,
	`average_cost_after_cents` int unsigned NOT NULL,
	`created_by_user_id` varchar(36) NOT NULL,
	`created_at` datetime(3) NOT NULL,
	CONSTRAINT `tape_movements_id` PRIMARY KEY(`id`),
	CONSTRAINT `tape_movements_receipt_stored_name_unique` UNIQUE(`receipt_stored_name`)
);
--> statement-breakpoint
CREATE TABLE `tape_products` (
	`id` bigint unsigned AUTO_INCREMENT NOT NULL,
	`sku` varchar(40) NOT NULL,
	`name` varchar(120) NOT NULL,
	`width_inches` enum('0.25','0.5','1','2') NOT NULL,
	`length_ft` int unsigned NOT NULL,
	`reel_inches` enum('5','7','10.5') NOT NULL,
	`description` text,
	`price_mode` enum('fixed','markup') NOT NULL,
	`fixed_price_cents` int unsigned,
	`markup_bp` int unsigned,
	`tax_category` enum('goods') NOT NULL DEFAULT 'goods',
	`reorder_point` int unsigned NOT NULL DEFAULT 0,
	`active` boolean NOT NULL DEFAULT true,
	`on_hand` int unsigned NOT NULL DEFAULT 0,
	`value_cents` bigint unsigned NOT NULL DEFAULT 0,
	`average_cost_cents` int unsigned NOT NULL DEFAULT 0,
	`low_stock_since` datetime(3),
	`created_at` datetime(3) NOT NULL,
	`updated_at` datetime(3) NOT NULL,
	CONSTRAINT `tape_products_id` PRIMARY KEY(`id`),
	CONSTRAINT `tape_products_sku_unique` UNIQUE(`sku`)
);
--> statement-breakpoint
ALTER TABLE `tape_low_stock_alerts` ADD CONSTRAINT `tape_low_stock_alerts_product_id_tape_products_id_fk` FOREIGN KEY (`product_id`) REFERENCES `tape_products`(`id`) ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `tape_movements` ADD CONSTRAINT `tape_movements_product_id_tape_products_id_fk` FOREIGN KEY (`product_id`) REFERENCES `tape_products`(`id`) ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `tape_movements` ADD CONSTRAINT `tape_movements_client_account_id_client_accounts_id_fk` FOREIGN KEY (`client_account_id`) REFERENCES `client_accounts`(`id`) ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `tape_movements` ADD CONSTRAINT `tape_movements_project_id_projects_id_fk` FOREIGN KEY (`project_id`) REFERENCES `projects`(`id`) ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `tape_movements` ADD CONSTRAINT `tape_movements_booking_id_bookings_id_fk` FOREIGN KEY (`booking_id`) REFERENCES `bookings`(`id`) ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `tape_movements` ADD CONSTRAINT `tape_movements_created_by_user_id_user_id_fk` FOREIGN KEY (`created_by_user_id`) REFERENCES `user`(`id`) ON DELETE no action ON UPDATE no action;--> statement-breakpoint
CREATE INDEX `tape_movements_product_idx` ON `tape_movements` (`product_id`,`id`);--> statement-breakpoint
CREATE INDEX `tape_movements_client_idx` ON `tape_movements` (`client_account_id`);--> statement-breakpoint
CREATE INDEX `tape_movements_kind_idx` ON `tape_movements` (`kind`,`created_at`);