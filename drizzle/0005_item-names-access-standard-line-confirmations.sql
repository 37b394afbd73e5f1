CREATE TABLE `line_confirmation` (
	`line_id` text PRIMARY KEY NOT NULL,
	`confirmed_by` text,
	`note` text,
	`created_at` integer DEFAULT (unixepoch('subsec') * 1000) NOT NULL,
	FOREIGN KEY (`line_id`) REFERENCES `spec_line`(`id`) ON UPDATE no action ON DELETE cascade,
	FOREIGN KEY (`confirmed_by`) REFERENCES `user`(`id`) ON UPDATE no action ON DELETE set null
);
--> statement-breakpoint
ALTER TABLE `studio` ADD `access_standard` text DEFAULT 'as1428' NOT NULL;--> statement-breakpoint
ALTER TABLE `option_line` ADD `item` text;