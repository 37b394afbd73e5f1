ALTER TABLE `user` ADD `phone` text;--> statement-breakpoint
ALTER TABLE `studio` ADD `markup_basis_points` integer DEFAULT 0 NOT NULL;--> statement-breakpoint
ALTER TABLE `studio` ADD `tax_basis_points` integer DEFAULT 1000 NOT NULL;--> statement-breakpoint
ALTER TABLE `decision_option` ADD `price_overridden` integer DEFAULT false NOT NULL;