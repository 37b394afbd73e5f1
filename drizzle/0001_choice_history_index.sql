DROP INDEX `choice_decision_idx`;--> statement-breakpoint
CREATE INDEX `choice_decision_time_idx` ON `choice` (`decision_id`,`created_at`);