CREATE TABLE `reinspections` (
	`id` varchar(36) CHARACTER SET utf8mb4 COLLATE utf8mb4_bin NOT NULL,
	`event_id` varchar(36) CHARACTER SET utf8mb4 COLLATE utf8mb4_bin NOT NULL,
	`entry_id` varchar(36) CHARACTER SET utf8mb4 COLLATE utf8mb4_bin NOT NULL,
	`cause` enum('incident','protest','other') NOT NULL,
	`asked_by` varchar(160) NOT NULL,
	`asked_at` datetime(3) NOT NULL,
	`reason` varchar(1000) NOT NULL,
	`created_by` varchar(255) CHARACTER SET utf8mb4 COLLATE utf8mb4_bin NOT NULL,
	`created_at` datetime(3) NOT NULL,
	`closed_at` datetime(3),
	`closed_by` varchar(255) CHARACTER SET utf8mb4 COLLATE utf8mb4_bin,
	`closing_note` varchar(1000),
	CONSTRAINT `reinspections_id` PRIMARY KEY(`id`)
);
--> statement-breakpoint
CREATE TABLE `run_group_drafts` (
	`event_id` varchar(36) CHARACTER SET utf8mb4 COLLATE utf8mb4_bin NOT NULL,
	`groups` json NOT NULL,
	`settings` json NOT NULL,
	`cap_cars` smallint NOT NULL,
	`revision` int NOT NULL,
	`updated_by` varchar(255) CHARACTER SET utf8mb4 COLLATE utf8mb4_bin NOT NULL,
	`updated_at` datetime(3) NOT NULL,
	CONSTRAINT `run_group_drafts_event_id` PRIMARY KEY(`event_id`)
);
--> statement-breakpoint
CREATE TABLE `session_calls` (
	`id` varchar(36) CHARACTER SET utf8mb4 COLLATE utf8mb4_bin NOT NULL,
	`event_id` varchar(36) CHARACTER SET utf8mb4 COLLATE utf8mb4_bin NOT NULL,
	`session_key` varchar(8) CHARACTER SET utf8mb4 COLLATE utf8mb4_bin NOT NULL,
	`group_name` varchar(40) NOT NULL,
	`round` smallint NOT NULL,
	`state` enum('called','on-track','red-flag','finished','cut-short') NOT NULL,
	`note` varchar(500),
	`called_at` datetime(3) NOT NULL,
	`called_by` varchar(255) CHARACTER SET utf8mb4 COLLATE utf8mb4_bin NOT NULL,
	CONSTRAINT `session_calls_id` PRIMARY KEY(`id`)
);
--> statement-breakpoint
ALTER TABLE `entries` ADD `driver_experience` enum('novice','intermediate','advanced','expert');--> statement-breakpoint
ALTER TABLE `entries` ADD `co_driver_experience` enum('novice','intermediate','advanced','expert');--> statement-breakpoint
ALTER TABLE `entries` ADD `co_driver_lap_time_estimate_ms` int;--> statement-breakpoint
ALTER TABLE `events` ADD `protest_window_minutes` smallint DEFAULT 30 NOT NULL;--> statement-breakpoint
ALTER TABLE `reinspections` ADD CONSTRAINT `reinspections_event_id_events_id_fk` FOREIGN KEY (`event_id`) REFERENCES `events`(`id`) ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `reinspections` ADD CONSTRAINT `reinspections_entry_id_entries_id_fk` FOREIGN KEY (`entry_id`) REFERENCES `entries`(`id`) ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `reinspections` ADD CONSTRAINT `reinspections_created_by_users_id_fk` FOREIGN KEY (`created_by`) REFERENCES `users`(`id`) ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `reinspections` ADD CONSTRAINT `reinspections_closed_by_users_id_fk` FOREIGN KEY (`closed_by`) REFERENCES `users`(`id`) ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `run_group_drafts` ADD CONSTRAINT `run_group_drafts_event_id_events_id_fk` FOREIGN KEY (`event_id`) REFERENCES `events`(`id`) ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `run_group_drafts` ADD CONSTRAINT `run_group_drafts_updated_by_users_id_fk` FOREIGN KEY (`updated_by`) REFERENCES `users`(`id`) ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `session_calls` ADD CONSTRAINT `session_calls_event_id_events_id_fk` FOREIGN KEY (`event_id`) REFERENCES `events`(`id`) ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `session_calls` ADD CONSTRAINT `session_calls_called_by_users_id_fk` FOREIGN KEY (`called_by`) REFERENCES `users`(`id`) ON DELETE no action ON UPDATE no action;--> statement-breakpoint
CREATE INDEX `reinspections_event_entry_idx` ON `reinspections` (`event_id`,`entry_id`);--> statement-breakpoint
CREATE INDEX `session_calls_event_idx` ON `session_calls` (`event_id`,`called_at`);