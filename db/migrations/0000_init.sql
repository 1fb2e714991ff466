CREATE TABLE `accounts` (
	`user_id` varchar(255) NOT NULL,
	`type` varchar(255) NOT NULL,
	`provider` varchar(255) NOT NULL,
	`provider_account_id` varchar(255) NOT NULL,
	`refresh_token` varchar(255),
	`access_token` varchar(255),
	`expires_at` int,
	`token_type` varchar(255),
	`scope` varchar(255),
	`id_token` varchar(2048),
	`session_state` varchar(255),
	CONSTRAINT `accounts_pk` PRIMARY KEY(`provider`,`provider_account_id`)
);
--> statement-breakpoint
CREATE TABLE `audit_log` (
	`id` bigint unsigned AUTO_INCREMENT NOT NULL,
	`event_id` varchar(36),
	`actor_id` varchar(255),
	`action` varchar(64) NOT NULL,
	`subject_type` varchar(40) NOT NULL,
	`subject_id` varchar(64) NOT NULL,
	`detail` json,
	`created_at` datetime(3) NOT NULL,
	CONSTRAINT `audit_log_id` PRIMARY KEY(`id`)
);
--> statement-breakpoint
CREATE TABLE `cars` (
	`id` varchar(36) NOT NULL,
	`owner_id` varchar(255) NOT NULL,
	`make` varchar(60) NOT NULL,
	`model` varchar(80) NOT NULL,
	`year` smallint NOT NULL,
	`colour` varchar(40) NOT NULL,
	`notes` varchar(500),
	`created_at` datetime(3) NOT NULL,
	`updated_at` datetime(3) NOT NULL,
	CONSTRAINT `cars_id` PRIMARY KEY(`id`)
);
--> statement-breakpoint
CREATE TABLE `clubs` (
	`id` varchar(36) NOT NULL,
	`name` varchar(120) NOT NULL,
	`slug` varchar(60) NOT NULL,
	`created_at` datetime(3) NOT NULL,
	CONSTRAINT `clubs_id` PRIMARY KEY(`id`),
	CONSTRAINT `clubs_slug_unique` UNIQUE(`slug`)
);
--> statement-breakpoint
CREATE TABLE `entries` (
	`id` varchar(36) NOT NULL,
	`event_id` varchar(36) NOT NULL,
	`car_id` varchar(36) NOT NULL,
	`car_number` smallint NOT NULL,
	`declared_class` varchar(40) NOT NULL,
	`driver_id` varchar(255) NOT NULL,
	`co_driver_id` varchar(255),
	`lap_time_estimate_ms` int,
	`declarations` json NOT NULL,
	`status` enum('entered','withdrawn') NOT NULL DEFAULT 'entered',
	`created_at` datetime(3) NOT NULL,
	`updated_at` datetime(3) NOT NULL,
	CONSTRAINT `entries_id` PRIMARY KEY(`id`),
	CONSTRAINT `entries_event_car_number_unique` UNIQUE(`event_id`,`car_number`)
);
--> statement-breakpoint
CREATE TABLE `event_officials` (
	`event_id` varchar(36) NOT NULL,
	`user_id` varchar(255) NOT NULL,
	`role` enum('organizer','registrar','chief-scrutineer','scrutineer','clerk-of-course') NOT NULL,
	`created_at` datetime(3) NOT NULL,
	CONSTRAINT `event_officials_pk` PRIMARY KEY(`event_id`,`user_id`,`role`)
);
--> statement-breakpoint
CREATE TABLE `event_pass_keys` (
	`kid` varchar(64) NOT NULL,
	`event_id` varchar(36) NOT NULL,
	`public_key_x` varchar(64) NOT NULL,
	`private_key_pkcs8` text NOT NULL,
	`created_at` datetime(3) NOT NULL,
	`retired_at` datetime(3),
	CONSTRAINT `event_pass_keys_kid` PRIMARY KEY(`kid`)
);
--> statement-breakpoint
CREATE TABLE `events` (
	`id` varchar(36) NOT NULL,
	`club_id` varchar(36) NOT NULL,
	`venue_id` varchar(36) NOT NULL,
	`name` varchar(160) NOT NULL,
	`slug` varchar(80) NOT NULL,
	`event_date` date NOT NULL,
	`time_zone` varchar(64) NOT NULL,
	`unit_system` enum('mm','in') NOT NULL,
	`status` enum('draft','entries-open','entries-closed','running','finished') NOT NULL DEFAULT 'draft',
	`rule_set_version_id` varchar(36) NOT NULL,
	`entry_fee_minor` int NOT NULL,
	`currency` char(3) NOT NULL,
	`capacity` smallint NOT NULL,
	`created_at` datetime(3) NOT NULL,
	`updated_at` datetime(3) NOT NULL,
	CONSTRAINT `events_id` PRIMARY KEY(`id`),
	CONSTRAINT `events_slug_unique` UNIQUE(`slug`)
);
--> statement-breakpoint
CREATE TABLE `mail_log` (
	`id` bigint unsigned AUTO_INCREMENT NOT NULL,
	`event_id` varchar(36),
	`to_address` varchar(255) NOT NULL,
	`subject` varchar(255) NOT NULL,
	`kind` varchar(40) NOT NULL,
	`message_id` varchar(255),
	`status` enum('sent','failed') NOT NULL,
	`error` varchar(500),
	`created_at` datetime(3) NOT NULL,
	CONSTRAINT `mail_log_id` PRIMARY KEY(`id`)
);
--> statement-breakpoint
CREATE TABLE `passes` (
	`id` varchar(36) NOT NULL,
	`event_id` varchar(36) NOT NULL,
	`entry_id` varchar(36) NOT NULL,
	`kid` varchar(64) NOT NULL,
	`token` text NOT NULL,
	`issued_at` datetime(3) NOT NULL,
	`expires_at` datetime(3) NOT NULL,
	`revoked_at` datetime(3),
	`revoked_reason` varchar(300),
	`revoked_by` varchar(255),
	CONSTRAINT `passes_id` PRIMARY KEY(`id`)
);
--> statement-breakpoint
CREATE TABLE `payments` (
	`id` varchar(36) NOT NULL,
	`event_id` varchar(36) NOT NULL,
	`entry_id` varchar(36) NOT NULL,
	`provider` varchar(30) NOT NULL,
	`provider_ref` varchar(120) NOT NULL,
	`amount_minor` int NOT NULL,
	`currency` char(3) NOT NULL,
	`status` enum('pending','paid','failed','refunded') NOT NULL,
	`created_at` datetime(3) NOT NULL,
	`updated_at` datetime(3) NOT NULL,
	CONSTRAINT `payments_id` PRIMARY KEY(`id`),
	CONSTRAINT `payments_provider_ref_unique` UNIQUE(`provider`,`provider_ref`)
);
--> statement-breakpoint
CREATE TABLE `records` (
	`id` char(36) NOT NULL,
	`event_id` varchar(36) NOT NULL,
	`entry_id` varchar(36) NOT NULL,
	`kind` enum('reading','checklist','photo','note','void','override') NOT NULL,
	`payload` json NOT NULL,
	`official_id` varchar(255) NOT NULL,
	`device_id` varchar(64) NOT NULL,
	`device_time` datetime(3) NOT NULL,
	`received_at` datetime(3) NOT NULL,
	CONSTRAINT `records_id` PRIMARY KEY(`id`)
);
--> statement-breakpoint
CREATE TABLE `rule_set_versions` (
	`id` varchar(36) NOT NULL,
	`rule_set_id` varchar(36) NOT NULL,
	`version` int NOT NULL,
	`body` json NOT NULL,
	`notes` varchar(500),
	`created_by` varchar(255),
	`created_at` datetime(3) NOT NULL,
	`locked_at` datetime(3),
	CONSTRAINT `rule_set_versions_id` PRIMARY KEY(`id`),
	CONSTRAINT `rule_set_versions_set_version_unique` UNIQUE(`rule_set_id`,`version`)
);
--> statement-breakpoint
CREATE TABLE `rule_sets` (
	`id` varchar(36) NOT NULL,
	`club_id` varchar(36) NOT NULL,
	`name` varchar(120) NOT NULL,
	`created_at` datetime(3) NOT NULL,
	CONSTRAINT `rule_sets_id` PRIMARY KEY(`id`)
);
--> statement-breakpoint
CREATE TABLE `run_group_publications` (
	`id` varchar(36) NOT NULL,
	`event_id` varchar(36) NOT NULL,
	`version` int NOT NULL,
	`body` json NOT NULL,
	`published_by` varchar(255) NOT NULL,
	`published_at` datetime(3) NOT NULL,
	CONSTRAINT `run_group_publications_id` PRIMARY KEY(`id`),
	CONSTRAINT `run_group_publications_event_version_unique` UNIQUE(`event_id`,`version`)
);
--> statement-breakpoint
CREATE TABLE `sessions` (
	`session_token` varchar(255) NOT NULL,
	`user_id` varchar(255) NOT NULL,
	`expires` timestamp NOT NULL,
	CONSTRAINT `sessions_session_token` PRIMARY KEY(`session_token`)
);
--> statement-breakpoint
CREATE TABLE `uploads` (
	`id` varchar(36) NOT NULL,
	`event_id` varchar(36) NOT NULL,
	`entry_id` varchar(36),
	`record_id` char(36),
	`kind` enum('photo','dyno-sheet','other') NOT NULL,
	`bucket` varchar(63) NOT NULL,
	`object_key` varchar(300) NOT NULL,
	`content_type` varchar(100) NOT NULL,
	`byte_size` int NOT NULL,
	`sha256` char(64),
	`uploaded_by` varchar(255) NOT NULL,
	`created_at` datetime(3) NOT NULL,
	CONSTRAINT `uploads_id` PRIMARY KEY(`id`),
	CONSTRAINT `uploads_object_unique` UNIQUE(`bucket`,`object_key`)
);
--> statement-breakpoint
CREATE TABLE `users` (
	`id` varchar(255) NOT NULL,
	`name` varchar(255),
	`email` varchar(255) NOT NULL,
	`email_verified` timestamp(3),
	`image` varchar(255),
	`password_hash` varchar(100),
	`created_at` datetime(3),
	CONSTRAINT `users_id` PRIMARY KEY(`id`),
	CONSTRAINT `users_email_unique` UNIQUE(`email`)
);
--> statement-breakpoint
CREATE TABLE `venues` (
	`id` varchar(36) NOT NULL,
	`club_id` varchar(36) NOT NULL,
	`name` varchar(120) NOT NULL,
	`track_length_m` int NOT NULL,
	`time_zone` varchar(64) NOT NULL,
	`max_cars_on_track` smallint,
	`cars_per_km` decimal(4,1),
	`created_at` datetime(3) NOT NULL,
	CONSTRAINT `venues_id` PRIMARY KEY(`id`)
);
--> statement-breakpoint
CREATE TABLE `verdicts` (
	`event_id` varchar(36) NOT NULL,
	`entry_id` varchar(36) NOT NULL,
	`status` enum('waiting','cleared','moved-up','re-measure','held') NOT NULL,
	`final_class` varchar(40),
	`needs_chief` boolean NOT NULL DEFAULT false,
	`reason` varchar(500) NOT NULL,
	`rule_set_version_id` varchar(36) NOT NULL,
	`result` json NOT NULL,
	`record_count` int NOT NULL,
	`computed_at` datetime(3) NOT NULL,
	CONSTRAINT `verdicts_pk` PRIMARY KEY(`event_id`,`entry_id`)
);
--> statement-breakpoint
CREATE TABLE `verification_tokens` (
	`identifier` varchar(255) NOT NULL,
	`token` varchar(255) NOT NULL,
	`expires` timestamp NOT NULL,
	CONSTRAINT `verification_tokens_pk` PRIMARY KEY(`identifier`,`token`)
);
--> statement-breakpoint
CREATE TABLE `waivers` (
	`id` varchar(36) NOT NULL,
	`event_id` varchar(36) NOT NULL,
	`entry_id` varchar(36) NOT NULL,
	`signer_id` varchar(255) NOT NULL,
	`signed_name` varchar(160) NOT NULL,
	`signed_at` datetime(3) NOT NULL,
	`is_minor` boolean NOT NULL DEFAULT false,
	`guardian_name` varchar(160),
	`guardian_signed_at` datetime(3),
	`text_version` varchar(40) NOT NULL,
	CONSTRAINT `waivers_id` PRIMARY KEY(`id`)
);
--> statement-breakpoint
ALTER TABLE `accounts` ADD CONSTRAINT `accounts_user_id_users_id_fk` FOREIGN KEY (`user_id`) REFERENCES `users`(`id`) ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `audit_log` ADD CONSTRAINT `audit_log_event_id_events_id_fk` FOREIGN KEY (`event_id`) REFERENCES `events`(`id`) ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `audit_log` ADD CONSTRAINT `audit_log_actor_id_users_id_fk` FOREIGN KEY (`actor_id`) REFERENCES `users`(`id`) ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `cars` ADD CONSTRAINT `cars_owner_id_users_id_fk` FOREIGN KEY (`owner_id`) REFERENCES `users`(`id`) ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `entries` ADD CONSTRAINT `entries_event_id_events_id_fk` FOREIGN KEY (`event_id`) REFERENCES `events`(`id`) ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `entries` ADD CONSTRAINT `entries_car_id_cars_id_fk` FOREIGN KEY (`car_id`) REFERENCES `cars`(`id`) ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `entries` ADD CONSTRAINT `entries_driver_id_users_id_fk` FOREIGN KEY (`driver_id`) REFERENCES `users`(`id`) ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `entries` ADD CONSTRAINT `entries_co_driver_id_users_id_fk` FOREIGN KEY (`co_driver_id`) REFERENCES `users`(`id`) ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `event_officials` ADD CONSTRAINT `event_officials_event_id_events_id_fk` FOREIGN KEY (`event_id`) REFERENCES `events`(`id`) ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `event_officials` ADD CONSTRAINT `event_officials_user_id_users_id_fk` FOREIGN KEY (`user_id`) REFERENCES `users`(`id`) ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `event_pass_keys` ADD CONSTRAINT `event_pass_keys_event_id_events_id_fk` FOREIGN KEY (`event_id`) REFERENCES `events`(`id`) ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `events` ADD CONSTRAINT `events_club_id_clubs_id_fk` FOREIGN KEY (`club_id`) REFERENCES `clubs`(`id`) ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `events` ADD CONSTRAINT `events_venue_id_venues_id_fk` FOREIGN KEY (`venue_id`) REFERENCES `venues`(`id`) ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `events` ADD CONSTRAINT `events_rule_set_version_id_rule_set_versions_id_fk` FOREIGN KEY (`rule_set_version_id`) REFERENCES `rule_set_versions`(`id`) ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `mail_log` ADD CONSTRAINT `mail_log_event_id_events_id_fk` FOREIGN KEY (`event_id`) REFERENCES `events`(`id`) ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `passes` ADD CONSTRAINT `passes_event_id_events_id_fk` FOREIGN KEY (`event_id`) REFERENCES `events`(`id`) ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `passes` ADD CONSTRAINT `passes_entry_id_entries_id_fk` FOREIGN KEY (`entry_id`) REFERENCES `entries`(`id`) ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `passes` ADD CONSTRAINT `passes_revoked_by_users_id_fk` FOREIGN KEY (`revoked_by`) REFERENCES `users`(`id`) ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `payments` ADD CONSTRAINT `payments_event_id_events_id_fk` FOREIGN KEY (`event_id`) REFERENCES `events`(`id`) ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `payments` ADD CONSTRAINT `payments_entry_id_entries_id_fk` FOREIGN KEY (`entry_id`) REFERENCES `entries`(`id`) ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `records` ADD CONSTRAINT `records_event_id_events_id_fk` FOREIGN KEY (`event_id`) REFERENCES `events`(`id`) ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `records` ADD CONSTRAINT `records_entry_id_entries_id_fk` FOREIGN KEY (`entry_id`) REFERENCES `entries`(`id`) ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `records` ADD CONSTRAINT `records_official_id_users_id_fk` FOREIGN KEY (`official_id`) REFERENCES `users`(`id`) ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `rule_set_versions` ADD CONSTRAINT `rule_set_versions_rule_set_id_rule_sets_id_fk` FOREIGN KEY (`rule_set_id`) REFERENCES `rule_sets`(`id`) ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `rule_set_versions` ADD CONSTRAINT `rule_set_versions_created_by_users_id_fk` FOREIGN KEY (`created_by`) REFERENCES `users`(`id`) ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `rule_sets` ADD CONSTRAINT `rule_sets_club_id_clubs_id_fk` FOREIGN KEY (`club_id`) REFERENCES `clubs`(`id`) ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `run_group_publications` ADD CONSTRAINT `run_group_publications_event_id_events_id_fk` FOREIGN KEY (`event_id`) REFERENCES `events`(`id`) ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `run_group_publications` ADD CONSTRAINT `run_group_publications_published_by_users_id_fk` FOREIGN KEY (`published_by`) REFERENCES `users`(`id`) ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `sessions` ADD CONSTRAINT `sessions_user_id_users_id_fk` FOREIGN KEY (`user_id`) REFERENCES `users`(`id`) ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `uploads` ADD CONSTRAINT `uploads_event_id_events_id_fk` FOREIGN KEY (`event_id`) REFERENCES `events`(`id`) ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `uploads` ADD CONSTRAINT `uploads_entry_id_entries_id_fk` FOREIGN KEY (`entry_id`) REFERENCES `entries`(`id`) ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `uploads` ADD CONSTRAINT `uploads_uploaded_by_users_id_fk` FOREIGN KEY (`uploaded_by`) REFERENCES `users`(`id`) ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `venues` ADD CONSTRAINT `venues_club_id_clubs_id_fk` FOREIGN KEY (`club_id`) REFERENCES `clubs`(`id`) ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `verdicts` ADD CONSTRAINT `verdicts_event_id_events_id_fk` FOREIGN KEY (`event_id`) REFERENCES `events`(`id`) ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `verdicts` ADD CONSTRAINT `verdicts_entry_id_entries_id_fk` FOREIGN KEY (`entry_id`) REFERENCES `entries`(`id`) ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `verdicts` ADD CONSTRAINT `verdicts_rule_set_version_id_rule_set_versions_id_fk` FOREIGN KEY (`rule_set_version_id`) REFERENCES `rule_set_versions`(`id`) ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `waivers` ADD CONSTRAINT `waivers_event_id_events_id_fk` FOREIGN KEY (`event_id`) REFERENCES `events`(`id`) ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `waivers` ADD CONSTRAINT `waivers_entry_id_entries_id_fk` FOREIGN KEY (`entry_id`) REFERENCES `entries`(`id`) ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `waivers` ADD CONSTRAINT `waivers_signer_id_users_id_fk` FOREIGN KEY (`signer_id`) REFERENCES `users`(`id`) ON DELETE no action ON UPDATE no action;--> statement-breakpoint
CREATE INDEX `audit_log_event_idx` ON `audit_log` (`event_id`,`created_at`);--> statement-breakpoint
CREATE INDEX `cars_owner_idx` ON `cars` (`owner_id`);--> statement-breakpoint
CREATE INDEX `entries_event_driver_idx` ON `entries` (`event_id`,`driver_id`);--> statement-breakpoint
CREATE INDEX `entries_driver_idx` ON `entries` (`driver_id`);--> statement-breakpoint
CREATE INDEX `entries_co_driver_idx` ON `entries` (`co_driver_id`);--> statement-breakpoint
CREATE INDEX `event_officials_user_idx` ON `event_officials` (`user_id`);--> statement-breakpoint
CREATE INDEX `event_pass_keys_event_idx` ON `event_pass_keys` (`event_id`);--> statement-breakpoint
CREATE INDEX `mail_log_event_idx` ON `mail_log` (`event_id`,`created_at`);--> statement-breakpoint
CREATE INDEX `passes_event_entry_idx` ON `passes` (`event_id`,`entry_id`);--> statement-breakpoint
CREATE INDEX `payments_event_entry_idx` ON `payments` (`event_id`,`entry_id`);--> statement-breakpoint
CREATE INDEX `records_event_entry_idx` ON `records` (`event_id`,`entry_id`);--> statement-breakpoint
CREATE INDEX `records_event_received_idx` ON `records` (`event_id`,`received_at`);--> statement-breakpoint
CREATE INDEX `uploads_event_entry_idx` ON `uploads` (`event_id`,`entry_id`);--> statement-breakpoint
CREATE INDEX `verdicts_event_status_idx` ON `verdicts` (`event_id`,`status`);--> statement-breakpoint
CREATE INDEX `waivers_event_entry_idx` ON `waivers` (`event_id`,`entry_id`);