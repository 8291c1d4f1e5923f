CREATE TABLE `client_credits` (
	`id` bigint unsigned AUTO_INCREMENT NOT NULL,
	`client_account_id` bigint unsigned NOT NULL,
	`amount_minor` int NOT NULL,
	`payment_id` bigint unsigned,
	`invoice_id` bigint unsigned,
	`note` varchar(200) NOT NULL,
	`created_at` datetime(3) NOT NULL,
	CONSTRAINT `client_credits_id` PRIMARY KEY(`id`)
);
--> statement-breakpoint
CREATE TABLE `credit_notes` (
	`id` bigint unsigned AUTO_INCREMENT NOT NULL,
	`invoice_id` bigint unsigned NOT NULL,
	`series` varchar(12) NOT NULL,
	`year` int NOT NULL,
	`sequence` int NOT NULL,
	`number` varchar(40) NOT NULL,
	`issued_on` char(10) NOT NULL,
	`reason` varchar(200) NOT NULL,
	`lines` json NOT NULL,
	`net_minor` int NOT NULL,
	`tax_minor` int NOT NULL,
	`total_minor` int NOT NULL,
	`created_by_user_id` varchar(36),
	`created_at` datetime(3) NOT NULL,
	CONSTRAINT `credit_notes_id` PRIMARY KEY(`id`),
	CONSTRAINT `credit_notes_number_unique` UNIQUE(`number`),
	CONSTRAINT `credit_notes_series_sequence` UNIQUE(`series`,`year`,`sequence`)
);
--> statement-breakpoint
CREATE TABLE `document_counters` (
	`series` varchar(12) NOT NULL,
	`year` int NOT NULL,
	`last_sequence` int NOT NULL DEFAULT 0,
	CONSTRAINT `document_counters_series_year_pk` PRIMARY KEY(`series`,`year`)
);
--> statement-breakpoint
CREATE TABLE `invoice_emails` (
	`id` bigint unsigned AUTO_INCREMENT NOT NULL,
	`invoice_id` bigint unsigned NOT NULL,
	`step` varchar(40) NOT NULL,
	`to_address` varchar(254) NOT NULL,
	`status` enum('pending','sending','sent','failed') NOT NULL DEFAULT 'pending',
	`created_at` datetime(3) NOT NULL,
	`sent_at` datetime(3),
	CONSTRAINT `invoice_emails_id` PRIMARY KEY(`id`),
	CONSTRAINT `invoice_emails_step` UNIQUE(`invoice_id`,`step`,`to_address`)
);
--> statement-breakpoint
CREATE TABLE `invoice_lines` (
	`id` bigint unsigned AUTO_INCREMENT NOT NULL,
	`invoice_id` bigint unsigned NOT NULL,
	`position` int NOT NULL,
	`source_kind` varchar(24) NOT NULL,
	`source_id` varchar(64),
	`group_label` varchar(160),
	`category` enum('room','engineer','tape_goods','storage','other') NOT NULL,
	`description` varchar(300) NOT NULL,
	`explanation` varchar(500),
	`quantity_milli` int NOT NULL,
	`unit` varchar(16) NOT NULL,
	`unit_price_minor` int NOT NULL,
	`fixed_amount_minor` int,
	`discount` json,
	`amount_minor` int NOT NULL,
	`discount_minor` int NOT NULL DEFAULT 0,
	`net_minor` int NOT NULL,
	`tax_rate_ppm` int NOT NULL DEFAULT 0,
	`tax_minor` int NOT NULL DEFAULT 0,
	CONSTRAINT `invoice_lines_id` PRIMARY KEY(`id`)
);
--> statement-breakpoint
CREATE TABLE `invoice_payments` (
	`id` bigint unsigned AUTO_INCREMENT NOT NULL,
	`invoice_id` bigint unsigned NOT NULL,
	`method` enum('cash','cheque','bank_transfer') NOT NULL,
	`reference` varchar(80),
	`received_on` char(10) NOT NULL,
	`amount_minor` int NOT NULL,
	`applied_minor` int NOT NULL,
	`credit_minor` int NOT NULL DEFAULT 0,
	`reversed_at` datetime(3),
	`reversal_reason` varchar(200),
	`recorded_by_user_id` varchar(36),
	`created_at` datetime(3) NOT NULL,
	CONSTRAINT `invoice_payments_id` PRIMARY KEY(`id`)
);
--> statement-breakpoint
CREATE TABLE `invoice_settings` (
	`id` int NOT NULL,
	`invoice_prefix` varchar(12) NOT NULL DEFAULT 'INV',
	`credit_note_prefix` varchar(12) NOT NULL DEFAULT 'CR',
	`terms_days` int NOT NULL DEFAULT 14,
	`deposit_terms_days` int NOT NULL DEFAULT 0,
	`tax_rates` json NOT NULL,
	`tax_calculation` enum('per_line','per_invoice') NOT NULL DEFAULT 'per_line',
	`tax_rounding` enum('half_up','down') NOT NULL DEFAULT 'half_up',
	`paper_size` enum('A4','LETTER') NOT NULL DEFAULT 'LETTER',
	`billing_basis` enum('booked','actual') NOT NULL DEFAULT 'booked',
	`reminder_days` json NOT NULL,
	`tax_number` varchar(40),
	`payment_instructions` text,
	`updated_at` datetime(3) NOT NULL,
	CONSTRAINT `invoice_settings_id` PRIMARY KEY(`id`)
);
--> statement-breakpoint
CREATE TABLE `invoiced_sources` (
	`source_kind` varchar(24) NOT NULL,
	`source_id` varchar(64) NOT NULL,
	`invoice_id` bigint unsigned NOT NULL,
	`created_at` datetime(3) NOT NULL,
	CONSTRAINT `invoiced_sources_source_kind_source_id_pk` PRIMARY KEY(`source_kind`,`source_id`)
);
--> statement-breakpoint
CREATE TABLE `invoices` (
	`id` bigint unsigned AUTO_INCREMENT NOT NULL,
	`kind` enum('standard','deposit') NOT NULL DEFAULT 'standard',
	`status` enum('draft','issued','part_paid','paid','void') NOT NULL DEFAULT 'draft',
	`client_account_id` bigint unsigned NOT NULL,
	`booking_id` bigint unsigned,
	`series` varchar(12),
	`year` int,
	`sequence` int,
	`number` varchar(40),
	`currency` char(3) NOT NULL,
	`issued_on` char(10),
	`due_on` char(10),
	`issued_at` datetime(3),
	`invoice_discount` json,
	`subtotal_minor` int NOT NULL DEFAULT 0,
	`discount_minor` int NOT NULL DEFAULT 0,
	`tax_minor` int NOT NULL DEFAULT 0,
	`total_minor` int NOT NULL DEFAULT 0,
	`deposit_applied_minor` int NOT NULL DEFAULT 0,
	`credit_applied_minor` int NOT NULL DEFAULT 0,
	`paid_minor` int NOT NULL DEFAULT 0,
	`credited_minor` int NOT NULL DEFAULT 0,
	`balance_minor` int NOT NULL DEFAULT 0,
	`tax_settings` json,
	`notes` text,
	`voided_at` datetime(3),
	`void_reason` varchar(200),
	`created_by_user_id` varchar(36),
	`created_at` datetime(3) NOT NULL,
	`updated_at` datetime(3) NOT NULL,
	CONSTRAINT `invoices_id` PRIMARY KEY(`id`),
	CONSTRAINT `invoices_number_unique` UNIQUE(`number`),
	CONSTRAINT `invoices_series_sequence` UNIQUE(`series`,`year`,`sequence`)
);
--> statement-breakpoint
ALTER TABLE `client_credits` ADD CONSTRAINT `client_credits_client_account_id_client_accounts_id_fk` FOREIGN KEY (`client_account_id`) REFERENCES `client_accounts`(`id`) ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `client_credits` ADD CONSTRAINT `client_credits_payment_id_invoice_payments_id_fk` FOREIGN KEY (`payment_id`) REFERENCES `invoice_payments`(`id`) ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `client_credits` ADD CONSTRAINT `client_credits_invoice_id_invoices_id_fk` FOREIGN KEY (`invoice_id`) REFERENCES `invoices`(`id`) ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `credit_notes` ADD CONSTRAINT `credit_notes_invoice_id_invoices_id_fk` FOREIGN KEY (`invoice_id`) REFERENCES `invoices`(`id`) ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `credit_notes` ADD CONSTRAINT `credit_notes_created_by_user_id_user_id_fk` FOREIGN KEY (`created_by_user_id`) REFERENCES `user`(`id`) ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `invoice_emails` ADD CONSTRAINT `invoice_emails_invoice_id_invoices_id_fk` FOREIGN KEY (`invoice_id`) REFERENCES `invoices`(`id`) ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `invoice_lines` ADD CONSTRAINT `invoice_lines_invoice_id_invoices_id_fk` FOREIGN KEY (`invoice_id`) REFERENCES `invoices`(`id`) ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `invoice_payments` ADD CONSTRAINT `invoice_payments_invoice_id_invoices_id_fk` FOREIGN KEY (`invoice_id`) REFERENCES `invoices`(`id`) ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `invoice_payments` ADD CONSTRAINT `invoice_payments_recorded_by_user_id_user_id_fk` FOREIGN KEY (`recorded_by_user_id`) REFERENCES `user`(`id`) ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `invoiced_sources` ADD CONSTRAINT `invoiced_sources_invoice_id_invoices_id_fk` FOREIGN KEY (`invoice_id`) REFERENCES `invoices`(`id`) ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `invoices` ADD CONSTRAINT `invoices_client_account_id_client_accounts_id_fk` FOREIGN KEY (`client_account_id`) REFERENCES `client_accounts`(`id`) ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `invoices` ADD CONSTRAINT `invoices_booking_id_bookings_id_fk` FOREIGN KEY (`booking_id`) REFERENCES `bookings`(`id`) ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `invoices` ADD CONSTRAINT `invoices_created_by_user_id_user_id_fk` FOREIGN KEY (`created_by_user_id`) REFERENCES `user`(`id`) ON DELETE no action ON UPDATE no action;--> statement-breakpoint
CREATE INDEX `client_credits_client` ON `client_credits` (`client_account_id`);--> statement-breakpoint
CREATE INDEX `credit_notes_invoice` ON `credit_notes` (`invoice_id`);--> statement-breakpoint
CREATE INDEX `invoice_lines_invoice` ON `invoice_lines` (`invoice_id`,`position`);--> statement-breakpoint
CREATE INDEX `invoice_payments_invoice` ON `invoice_payments` (`invoice_id`);--> statement-breakpoint
CREATE INDEX `invoiced_sources_invoice` ON `invoiced_sources` (`invoice_id`);--> statement-breakpoint
CREATE INDEX `invoices_client_status` ON `invoices` (`client_account_id`,`status`);--> statement-breakpoint
CREATE INDEX `invoices_status_due` ON `invoices` (`status`,`due_on`);--> statement-breakpoint
CREATE INDEX `invoices_booking` ON `invoices` (`booking_id`);