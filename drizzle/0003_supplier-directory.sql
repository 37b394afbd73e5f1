CREATE TABLE `supplier_contact` (
	`id` text PRIMARY KEY NOT NULL,
	`supplier_id` text NOT NULL,
	`name` text NOT NULL,
	`email` text,
	`phone` text,
	`role` text,
	`sort_order` integer DEFAULT 0 NOT NULL,
	`created_at` integer DEFAULT (unixepoch('subsec') * 1000) NOT NULL,
	FOREIGN KEY (`supplier_id`) REFERENCES `supplier`(`id`) ON UPDATE no action ON DELETE cascade
);
--> statement-breakpoint
CREATE INDEX `supplier_contact_supplier_idx` ON `supplier_contact` (`supplier_id`);--> statement-breakpoint
ALTER TABLE `supplier` ADD `account_number` text;--> statement-breakpoint
ALTER TABLE `supplier` ADD `notes` text;--> statement-breakpoint
ALTER TABLE `supplier` ADD `archived_at` integer;