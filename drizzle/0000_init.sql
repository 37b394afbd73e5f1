CREATE TABLE `account` (
	`userId` text NOT NULL,
	`type` text NOT NULL,
	`provider` text NOT NULL,
	`providerAccountId` text NOT NULL,
	`refresh_token` text,
	`access_token` text,
	`expires_at` integer,
	`token_type` text,
	`scope` text,
	`id_token` text,
	`session_state` text,
	PRIMARY KEY(`provider`, `providerAccountId`),
	FOREIGN KEY (`userId`) REFERENCES `user`(`id`) ON UPDATE no action ON DELETE cascade
);
--> statement-breakpoint
CREATE TABLE `session` (
	`sessionToken` text PRIMARY KEY NOT NULL,
	`userId` text NOT NULL,
	`expires` integer NOT NULL,
	FOREIGN KEY (`userId`) REFERENCES `user`(`id`) ON UPDATE no action ON DELETE cascade
);
--> statement-breakpoint
CREATE TABLE `sign_in_throttle` (
	`key` text PRIMARY KEY NOT NULL,
	`failures` integer DEFAULT 0 NOT NULL,
	`window_started_at` integer NOT NULL
);
--> statement-breakpoint
CREATE TABLE `user` (
	`id` text PRIMARY KEY NOT NULL,
	`name` text,
	`email` text NOT NULL,
	`emailVerified` integer,
	`image` text,
	`password_hash` text,
	`created_at` integer DEFAULT (unixepoch('subsec') * 1000) NOT NULL
);
--> statement-breakpoint
CREATE UNIQUE INDEX `user_email_unique` ON `user` (`email`);--> statement-breakpoint
CREATE TABLE `verificationToken` (
	`identifier` text NOT NULL,
	`token` text NOT NULL,
	`expires` integer NOT NULL,
	PRIMARY KEY(`identifier`, `token`)
);
--> statement-breakpoint
CREATE TABLE `project_member` (
	`id` text PRIMARY KEY NOT NULL,
	`project_id` text NOT NULL,
	`user_id` text NOT NULL,
	`role` text NOT NULL,
	`supplier_id` text,
	`invited_by` text,
	`created_at` integer DEFAULT (unixepoch('subsec') * 1000) NOT NULL,
	FOREIGN KEY (`project_id`) REFERENCES `project`(`id`) ON UPDATE no action ON DELETE cascade,
	FOREIGN KEY (`user_id`) REFERENCES `user`(`id`) ON UPDATE no action ON DELETE cascade,
	FOREIGN KEY (`supplier_id`) REFERENCES `supplier`(`id`) ON UPDATE no action ON DELETE cascade,
	FOREIGN KEY (`invited_by`) REFERENCES `user`(`id`) ON UPDATE no action ON DELETE set null
);
--> statement-breakpoint
CREATE UNIQUE INDEX `project_member_unique` ON `project_member` (`project_id`,`user_id`);--> statement-breakpoint
CREATE INDEX `project_member_user_idx` ON `project_member` (`user_id`);--> statement-breakpoint
CREATE TABLE `project` (
	`id` text PRIMARY KEY NOT NULL,
	`studio_id` text NOT NULL,
	`name` text NOT NULL,
	`site_address` text,
	`install_date` text,
	`archived_at` integer,
	`created_at` integer DEFAULT (unixepoch('subsec') * 1000) NOT NULL,
	FOREIGN KEY (`studio_id`) REFERENCES `studio`(`id`) ON UPDATE no action ON DELETE cascade
);
--> statement-breakpoint
CREATE INDEX `project_studio_idx` ON `project` (`studio_id`);--> statement-breakpoint
CREATE TABLE `room` (
	`id` text PRIMARY KEY NOT NULL,
	`project_id` text NOT NULL,
	`name` text NOT NULL,
	`sort_order` integer DEFAULT 0 NOT NULL,
	`created_at` integer DEFAULT (unixepoch('subsec') * 1000) NOT NULL,
	FOREIGN KEY (`project_id`) REFERENCES `project`(`id`) ON UPDATE no action ON DELETE cascade
);
--> statement-breakpoint
CREATE INDEX `room_project_idx` ON `room` (`project_id`);--> statement-breakpoint
CREATE TABLE `studio_member` (
	`studio_id` text NOT NULL,
	`user_id` text NOT NULL,
	`role` text NOT NULL,
	`created_at` integer DEFAULT (unixepoch('subsec') * 1000) NOT NULL,
	PRIMARY KEY(`studio_id`, `user_id`),
	FOREIGN KEY (`studio_id`) REFERENCES `studio`(`id`) ON UPDATE no action ON DELETE cascade,
	FOREIGN KEY (`user_id`) REFERENCES `user`(`id`) ON UPDATE no action ON DELETE cascade
);
--> statement-breakpoint
CREATE INDEX `studio_member_user_idx` ON `studio_member` (`user_id`);--> statement-breakpoint
CREATE TABLE `studio` (
	`id` text PRIMARY KEY NOT NULL,
	`name` text NOT NULL,
	`check_settings` text,
	`created_at` integer DEFAULT (unixepoch('subsec') * 1000) NOT NULL
);
--> statement-breakpoint
CREATE TABLE `supplier` (
	`id` text PRIMARY KEY NOT NULL,
	`studio_id` text NOT NULL,
	`name` text NOT NULL,
	`trade` text NOT NULL,
	`email` text,
	`phone` text,
	`created_at` integer DEFAULT (unixepoch('subsec') * 1000) NOT NULL,
	FOREIGN KEY (`studio_id`) REFERENCES `studio`(`id`) ON UPDATE no action ON DELETE cascade
);
--> statement-breakpoint
CREATE INDEX `supplier_studio_idx` ON `supplier` (`studio_id`);--> statement-breakpoint
CREATE TABLE `finish` (
	`id` text PRIMARY KEY NOT NULL,
	`studio_id` text NOT NULL,
	`supplier_id` text,
	`name` text NOT NULL,
	`category` text NOT NULL,
	`product_code` text,
	`surface` text,
	`format` text,
	`unit` text NOT NULL,
	`unit_price_cents` integer NOT NULL,
	`lead_time_days` integer NOT NULL,
	`care_notes` text,
	`cautions` text DEFAULT '[]' NOT NULL,
	`lab_l` real NOT NULL,
	`lab_a` real NOT NULL,
	`lab_b` real NOT NULL,
	`colour_source` text NOT NULL,
	`lrv` real NOT NULL,
	`lrv_source` text NOT NULL,
	`image_id` text,
	`archived_at` integer,
	`created_at` integer DEFAULT (unixepoch('subsec') * 1000) NOT NULL,
	`updated_at` integer DEFAULT (unixepoch('subsec') * 1000) NOT NULL,
	FOREIGN KEY (`studio_id`) REFERENCES `studio`(`id`) ON UPDATE no action ON DELETE cascade,
	FOREIGN KEY (`supplier_id`) REFERENCES `supplier`(`id`) ON UPDATE no action ON DELETE set null,
	FOREIGN KEY (`image_id`) REFERENCES `image`(`id`) ON UPDATE no action ON DELETE set null
);
--> statement-breakpoint
CREATE INDEX `finish_studio_idx` ON `finish` (`studio_id`,`category`);--> statement-breakpoint
CREATE INDEX `finish_supplier_idx` ON `finish` (`supplier_id`);--> statement-breakpoint
CREATE INDEX `finish_lab_l_idx` ON `finish` (`studio_id`,`lab_l`);--> statement-breakpoint
CREATE TABLE `image` (
	`id` text PRIMARY KEY NOT NULL,
	`studio_id` text NOT NULL,
	`uploaded_by` text,
	`storage_key` text NOT NULL,
	`width` integer NOT NULL,
	`height` integer NOT NULL,
	`bytes` integer NOT NULL,
	`created_at` integer DEFAULT (unixepoch('subsec') * 1000) NOT NULL,
	FOREIGN KEY (`studio_id`) REFERENCES `studio`(`id`) ON UPDATE no action ON DELETE cascade,
	FOREIGN KEY (`uploaded_by`) REFERENCES `user`(`id`) ON UPDATE no action ON DELETE set null
);
--> statement-breakpoint
CREATE UNIQUE INDEX `image_storage_key_unique` ON `image` (`storage_key`);--> statement-breakpoint
CREATE INDEX `image_studio_idx` ON `image` (`studio_id`);--> statement-breakpoint
CREATE TABLE `adjacency` (
	`id` text PRIMARY KEY NOT NULL,
	`board_id` text NOT NULL,
	`item_a_id` text NOT NULL,
	`item_b_id` text NOT NULL,
	`intent` text NOT NULL,
	`access_relevant` integer DEFAULT false NOT NULL,
	`created_at` integer DEFAULT (unixepoch('subsec') * 1000) NOT NULL,
	FOREIGN KEY (`board_id`) REFERENCES `board`(`id`) ON UPDATE no action ON DELETE cascade,
	FOREIGN KEY (`item_a_id`) REFERENCES `board_item`(`id`) ON UPDATE no action ON DELETE cascade,
	FOREIGN KEY (`item_b_id`) REFERENCES `board_item`(`id`) ON UPDATE no action ON DELETE cascade
);
--> statement-breakpoint
CREATE INDEX `adjacency_board_idx` ON `adjacency` (`board_id`);--> statement-breakpoint
CREATE TABLE `board_item` (
	`id` text PRIMARY KEY NOT NULL,
	`board_id` text NOT NULL,
	`finish_id` text NOT NULL,
	`label` text NOT NULL,
	`x` real NOT NULL,
	`y` real NOT NULL,
	`width` real NOT NULL,
	`height` real NOT NULL,
	`sort_order` integer DEFAULT 0 NOT NULL,
	`created_at` integer DEFAULT (unixepoch('subsec') * 1000) NOT NULL,
	FOREIGN KEY (`board_id`) REFERENCES `board`(`id`) ON UPDATE no action ON DELETE cascade,
	FOREIGN KEY (`finish_id`) REFERENCES `finish`(`id`) ON UPDATE no action ON DELETE restrict
);
--> statement-breakpoint
CREATE INDEX `board_item_board_idx` ON `board_item` (`board_id`);--> statement-breakpoint
CREATE TABLE `board` (
	`id` text PRIMARY KEY NOT NULL,
	`project_id` text NOT NULL,
	`room_id` text NOT NULL,
	`name` text NOT NULL,
	`version` integer DEFAULT 1 NOT NULL,
	`created_at` integer DEFAULT (unixepoch('subsec') * 1000) NOT NULL,
	`updated_at` integer DEFAULT (unixepoch('subsec') * 1000) NOT NULL,
	FOREIGN KEY (`project_id`) REFERENCES `project`(`id`) ON UPDATE no action ON DELETE cascade,
	FOREIGN KEY (`room_id`) REFERENCES `room`(`id`) ON UPDATE no action ON DELETE cascade
);
--> statement-breakpoint
CREATE INDEX `board_project_idx` ON `board` (`project_id`);--> statement-breakpoint
CREATE INDEX `board_room_idx` ON `board` (`room_id`);--> statement-breakpoint
CREATE TABLE `approval` (
	`id` text PRIMARY KEY NOT NULL,
	`decision_id` text NOT NULL,
	`option_id` text NOT NULL,
	`user_id` text NOT NULL,
	`variation_id` text,
	`snapshot` text NOT NULL,
	`created_at` integer DEFAULT (unixepoch('subsec') * 1000) NOT NULL,
	FOREIGN KEY (`decision_id`) REFERENCES `decision`(`id`) ON UPDATE no action ON DELETE cascade,
	FOREIGN KEY (`option_id`) REFERENCES `decision_option`(`id`) ON UPDATE no action ON DELETE restrict,
	FOREIGN KEY (`user_id`) REFERENCES `user`(`id`) ON UPDATE no action ON DELETE restrict
);
--> statement-breakpoint
CREATE INDEX `approval_decision_idx` ON `approval` (`decision_id`);--> statement-breakpoint
CREATE TABLE `choice` (
	`id` text PRIMARY KEY NOT NULL,
	`decision_id` text NOT NULL,
	`option_id` text NOT NULL,
	`user_id` text NOT NULL,
	`comment` text,
	`created_at` integer DEFAULT (unixepoch('subsec') * 1000) NOT NULL,
	FOREIGN KEY (`decision_id`) REFERENCES `decision`(`id`) ON UPDATE no action ON DELETE cascade,
	FOREIGN KEY (`option_id`) REFERENCES `decision_option`(`id`) ON UPDATE no action ON DELETE cascade,
	FOREIGN KEY (`user_id`) REFERENCES `user`(`id`) ON UPDATE no action ON DELETE restrict
);
--> statement-breakpoint
CREATE INDEX `choice_decision_idx` ON `choice` (`decision_id`);--> statement-breakpoint
CREATE TABLE `decision` (
	`id` text PRIMARY KEY NOT NULL,
	`project_id` text NOT NULL,
	`room_id` text NOT NULL,
	`title` text NOT NULL,
	`allowance_cents` integer NOT NULL,
	`due_date` text NOT NULL,
	`status` text DEFAULT 'open' NOT NULL,
	`locked_option_id` text,
	`locked_at` integer,
	`version` integer DEFAULT 1 NOT NULL,
	`created_at` integer DEFAULT (unixepoch('subsec') * 1000) NOT NULL,
	`updated_at` integer DEFAULT (unixepoch('subsec') * 1000) NOT NULL,
	FOREIGN KEY (`project_id`) REFERENCES `project`(`id`) ON UPDATE no action ON DELETE cascade,
	FOREIGN KEY (`room_id`) REFERENCES `room`(`id`) ON UPDATE no action ON DELETE restrict
);
--> statement-breakpoint
CREATE INDEX `decision_project_idx` ON `decision` (`project_id`,`due_date`);--> statement-breakpoint
CREATE TABLE `option_line` (
	`id` text PRIMARY KEY NOT NULL,
	`option_id` text NOT NULL,
	`finish_id` text NOT NULL,
	`quantity` real NOT NULL,
	`unit` text NOT NULL,
	`location` text,
	`sort_order` integer DEFAULT 0 NOT NULL,
	FOREIGN KEY (`option_id`) REFERENCES `decision_option`(`id`) ON UPDATE no action ON DELETE cascade,
	FOREIGN KEY (`finish_id`) REFERENCES `finish`(`id`) ON UPDATE no action ON DELETE restrict
);
--> statement-breakpoint
CREATE INDEX `option_line_option_idx` ON `option_line` (`option_id`);--> statement-breakpoint
CREATE TABLE `decision_option` (
	`id` text PRIMARY KEY NOT NULL,
	`decision_id` text NOT NULL,
	`label` text NOT NULL,
	`price_cents` integer NOT NULL,
	`notes` text,
	`board_id` text,
	`sort_order` integer DEFAULT 0 NOT NULL,
	`added_by_variation` integer DEFAULT false NOT NULL,
	`created_at` integer DEFAULT (unixepoch('subsec') * 1000) NOT NULL,
	FOREIGN KEY (`decision_id`) REFERENCES `decision`(`id`) ON UPDATE no action ON DELETE cascade,
	FOREIGN KEY (`board_id`) REFERENCES `board`(`id`) ON UPDATE no action ON DELETE set null
);
--> statement-breakpoint
CREATE INDEX `option_decision_idx` ON `decision_option` (`decision_id`);--> statement-breakpoint
CREATE TABLE `variation` (
	`id` text PRIMARY KEY NOT NULL,
	`decision_id` text NOT NULL,
	`requested_by` text NOT NULL,
	`reason` text NOT NULL,
	`option_id` text,
	`status` text DEFAULT 'requested' NOT NULL,
	`price_delta_cents` integer,
	`time_impact_days` integer,
	`priced_by` text,
	`priced_at` integer,
	`decided_by` text,
	`decided_at` integer,
	`created_at` integer DEFAULT (unixepoch('subsec') * 1000) NOT NULL,
	`updated_at` integer DEFAULT (unixepoch('subsec') * 1000) NOT NULL,
	FOREIGN KEY (`decision_id`) REFERENCES `decision`(`id`) ON UPDATE no action ON DELETE cascade,
	FOREIGN KEY (`requested_by`) REFERENCES `user`(`id`) ON UPDATE no action ON DELETE restrict,
	FOREIGN KEY (`option_id`) REFERENCES `decision_option`(`id`) ON UPDATE no action ON DELETE restrict,
	FOREIGN KEY (`priced_by`) REFERENCES `user`(`id`) ON UPDATE no action ON DELETE restrict,
	FOREIGN KEY (`decided_by`) REFERENCES `user`(`id`) ON UPDATE no action ON DELETE restrict
);
--> statement-breakpoint
CREATE INDEX `variation_decision_idx` ON `variation` (`decision_id`);--> statement-breakpoint
CREATE TABLE `fixed_item` (
	`id` text PRIMARY KEY NOT NULL,
	`project_id` text NOT NULL,
	`room_id` text NOT NULL,
	`finish_id` text NOT NULL,
	`item` text NOT NULL,
	`location` text,
	`quantity` real NOT NULL,
	`unit` text NOT NULL,
	`notes` text,
	`created_at` integer DEFAULT (unixepoch('subsec') * 1000) NOT NULL,
	FOREIGN KEY (`project_id`) REFERENCES `project`(`id`) ON UPDATE no action ON DELETE cascade,
	FOREIGN KEY (`room_id`) REFERENCES `room`(`id`) ON UPDATE no action ON DELETE restrict,
	FOREIGN KEY (`finish_id`) REFERENCES `finish`(`id`) ON UPDATE no action ON DELETE restrict
);
--> statement-breakpoint
CREATE INDEX `fixed_item_project_idx` ON `fixed_item` (`project_id`);--> statement-breakpoint
CREATE TABLE `line_order` (
	`line_id` text PRIMARY KEY NOT NULL,
	`ordered_on` text,
	`expected_on` text,
	`updated_by` text,
	`updated_at` integer NOT NULL,
	FOREIGN KEY (`line_id`) REFERENCES `spec_line`(`id`) ON UPDATE no action ON DELETE cascade,
	FOREIGN KEY (`updated_by`) REFERENCES `user`(`id`) ON UPDATE no action ON DELETE set null
);
--> statement-breakpoint
CREATE TABLE `spec_line` (
	`id` text PRIMARY KEY NOT NULL,
	`revision_id` text NOT NULL,
	`line_key` text NOT NULL,
	`room` text NOT NULL,
	`item` text NOT NULL,
	`location` text,
	`finish_id` text,
	`finish_name` text NOT NULL,
	`supplier_id` text,
	`supplier_name` text,
	`product_code` text,
	`quantity` real NOT NULL,
	`unit` text NOT NULL,
	`lead_time_days` integer NOT NULL,
	`order_by_date` text,
	`cautions` text DEFAULT '[]' NOT NULL,
	`sort_order` integer DEFAULT 0 NOT NULL,
	FOREIGN KEY (`revision_id`) REFERENCES `spec_revision`(`id`) ON UPDATE no action ON DELETE cascade,
	FOREIGN KEY (`finish_id`) REFERENCES `finish`(`id`) ON UPDATE no action ON DELETE restrict,
	FOREIGN KEY (`supplier_id`) REFERENCES `supplier`(`id`) ON UPDATE no action ON DELETE set null
);
--> statement-breakpoint
CREATE INDEX `spec_line_revision_idx` ON `spec_line` (`revision_id`,`supplier_id`);--> statement-breakpoint
CREATE TABLE `spec_revision` (
	`id` text PRIMARY KEY NOT NULL,
	`project_id` text NOT NULL,
	`letter` text NOT NULL,
	`sequence` integer NOT NULL,
	`created_at` integer DEFAULT (unixepoch('subsec') * 1000) NOT NULL,
	`issued_by` text NOT NULL,
	`content` text NOT NULL,
	`sha256` text NOT NULL,
	FOREIGN KEY (`project_id`) REFERENCES `project`(`id`) ON UPDATE no action ON DELETE cascade,
	FOREIGN KEY (`issued_by`) REFERENCES `user`(`id`) ON UPDATE no action ON DELETE restrict
);
--> statement-breakpoint
CREATE UNIQUE INDEX `spec_revision_letter_unique` ON `spec_revision` (`project_id`,`sequence`);--> statement-breakpoint
CREATE TABLE `supplier_acknowledgement` (
	`id` text PRIMARY KEY NOT NULL,
	`revision_id` text NOT NULL,
	`supplier_id` text NOT NULL,
	`user_id` text NOT NULL,
	`created_at` integer DEFAULT (unixepoch('subsec') * 1000) NOT NULL,
	FOREIGN KEY (`revision_id`) REFERENCES `spec_revision`(`id`) ON UPDATE no action ON DELETE cascade,
	FOREIGN KEY (`supplier_id`) REFERENCES `supplier`(`id`) ON UPDATE no action ON DELETE cascade,
	FOREIGN KEY (`user_id`) REFERENCES `user`(`id`) ON UPDATE no action ON DELETE restrict
);
--> statement-breakpoint
CREATE UNIQUE INDEX `supplier_ack_unique` ON `supplier_acknowledgement` (`revision_id`,`supplier_id`);--> statement-breakpoint
CREATE TABLE `audit_log` (
	`id` text PRIMARY KEY NOT NULL,
	`studio_id` text NOT NULL,
	`project_id` text,
	`actor_id` text,
	`action` text NOT NULL,
	`entity_type` text NOT NULL,
	`entity_id` text NOT NULL,
	`detail` text,
	`created_at` integer DEFAULT (unixepoch('subsec') * 1000) NOT NULL,
	FOREIGN KEY (`studio_id`) REFERENCES `studio`(`id`) ON UPDATE no action ON DELETE cascade,
	FOREIGN KEY (`project_id`) REFERENCES `project`(`id`) ON UPDATE no action ON DELETE cascade,
	FOREIGN KEY (`actor_id`) REFERENCES `user`(`id`) ON UPDATE no action ON DELETE set null
);
--> statement-breakpoint
CREATE INDEX `audit_project_idx` ON `audit_log` (`project_id`,`created_at`);--> statement-breakpoint
CREATE INDEX `audit_studio_idx` ON `audit_log` (`studio_id`,`created_at`);