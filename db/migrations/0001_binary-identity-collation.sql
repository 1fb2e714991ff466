-- Identifiers, tokens, slugs, keys and e-mail addresses compare byte for byte (db/schema.ts):
-- utf8mb4_unicode_ci let `organizer@brackenmöor.test` find `organizer@brackenmoor.test`.
-- MariaDB will not change the collation of a column a foreign key uses, even with
-- FOREIGN_KEY_CHECKS = 0, so the foreign keys are dropped, the columns changed (one rebuild per
-- table) and the foreign keys added back, checked against the rows (a row that only matched
-- its parent by ignoring case or accents stops the migration instead of being kept).
ALTER TABLE `accounts` DROP FOREIGN KEY `accounts_user_id_users_id_fk`;--> statement-breakpoint
ALTER TABLE `audit_log` DROP FOREIGN KEY `audit_log_event_id_events_id_fk`, DROP FOREIGN KEY `audit_log_actor_id_users_id_fk`;--> statement-breakpoint
ALTER TABLE `cars` DROP FOREIGN KEY `cars_owner_id_users_id_fk`;--> statement-breakpoint
ALTER TABLE `entries` DROP FOREIGN KEY `entries_event_id_events_id_fk`, DROP FOREIGN KEY `entries_car_id_cars_id_fk`, DROP FOREIGN KEY `entries_driver_id_users_id_fk`, DROP FOREIGN KEY `entries_co_driver_id_users_id_fk`;--> statement-breakpoint
ALTER TABLE `event_officials` DROP FOREIGN KEY `event_officials_event_id_events_id_fk`, DROP FOREIGN KEY `event_officials_user_id_users_id_fk`;--> statement-breakpoint
ALTER TABLE `event_pass_keys` DROP FOREIGN KEY `event_pass_keys_event_id_events_id_fk`;--> statement-breakpoint
ALTER TABLE `events` DROP FOREIGN KEY `events_club_id_clubs_id_fk`, DROP FOREIGN KEY `events_venue_id_venues_id_fk`, DROP FOREIGN KEY `events_rule_set_version_id_rule_set_versions_id_fk`;--> statement-breakpoint
ALTER TABLE `mail_log` DROP FOREIGN KEY `mail_log_event_id_events_id_fk`;--> statement-breakpoint
ALTER TABLE `passes` DROP FOREIGN KEY `passes_event_id_events_id_fk`, DROP FOREIGN KEY `passes_entry_id_entries_id_fk`, DROP FOREIGN KEY `passes_revoked_by_users_id_fk`;--> statement-breakpoint
ALTER TABLE `payments` DROP FOREIGN KEY `payments_event_id_events_id_fk`, DROP FOREIGN KEY `payments_entry_id_entries_id_fk`;--> statement-breakpoint
ALTER TABLE `records` DROP FOREIGN KEY `records_event_id_events_id_fk`, DROP FOREIGN KEY `records_entry_id_entries_id_fk`, DROP FOREIGN KEY `records_official_id_users_id_fk`;--> statement-breakpoint
ALTER TABLE `rule_set_versions` DROP FOREIGN KEY `rule_set_versions_rule_set_id_rule_sets_id_fk`, DROP FOREIGN KEY `rule_set_versions_created_by_users_id_fk`;--> statement-breakpoint
ALTER TABLE `rule_sets` DROP FOREIGN KEY `rule_sets_club_id_clubs_id_fk`;--> statement-breakpoint
ALTER TABLE `run_group_publications` DROP FOREIGN KEY `run_group_publications_event_id_events_id_fk`, DROP FOREIGN KEY `run_group_publications_published_by_users_id_fk`;--> statement-breakpoint
ALTER TABLE `sessions` DROP FOREIGN KEY `sessions_user_id_users_id_fk`;--> statement-breakpoint
ALTER TABLE `uploads` DROP FOREIGN KEY `uploads_event_id_events_id_fk`, DROP FOREIGN KEY `uploads_entry_id_entries_id_fk`, DROP FOREIGN KEY `uploads_uploaded_by_users_id_fk`;--> statement-breakpoint
ALTER TABLE `venues` DROP FOREIGN KEY `venues_club_id_clubs_id_fk`;--> statement-breakpoint
ALTER TABLE `verdicts` DROP FOREIGN KEY `verdicts_event_id_events_id_fk`, DROP FOREIGN KEY `verdicts_entry_id_entries_id_fk`, DROP FOREIGN KEY `verdicts_rule_set_version_id_rule_set_versions_id_fk`;--> statement-breakpoint
ALTER TABLE `waivers` DROP FOREIGN KEY `waivers_event_id_events_id_fk`, DROP FOREIGN KEY `waivers_entry_id_entries_id_fk`, DROP FOREIGN KEY `waivers_signer_id_users_id_fk`;--> statement-breakpoint
ALTER TABLE `accounts`
  MODIFY COLUMN `user_id` varchar(255) CHARACTER SET utf8mb4 COLLATE utf8mb4_bin NOT NULL,
  MODIFY COLUMN `provider` varchar(255) CHARACTER SET utf8mb4 COLLATE utf8mb4_bin NOT NULL,
  MODIFY COLUMN `provider_account_id` varchar(255) CHARACTER SET utf8mb4 COLLATE utf8mb4_bin NOT NULL;--> statement-breakpoint
ALTER TABLE `audit_log`
  MODIFY COLUMN `event_id` varchar(36) CHARACTER SET utf8mb4 COLLATE utf8mb4_bin,
  MODIFY COLUMN `actor_id` varchar(255) CHARACTER SET utf8mb4 COLLATE utf8mb4_bin,
  MODIFY COLUMN `subject_id` varchar(64) CHARACTER SET utf8mb4 COLLATE utf8mb4_bin NOT NULL;--> statement-breakpoint
ALTER TABLE `cars`
  MODIFY COLUMN `id` varchar(36) CHARACTER SET utf8mb4 COLLATE utf8mb4_bin NOT NULL,
  MODIFY COLUMN `owner_id` varchar(255) CHARACTER SET utf8mb4 COLLATE utf8mb4_bin NOT NULL;--> statement-breakpoint
ALTER TABLE `clubs`
  MODIFY COLUMN `id` varchar(36) CHARACTER SET utf8mb4 COLLATE utf8mb4_bin NOT NULL,
  MODIFY COLUMN `slug` varchar(60) CHARACTER SET utf8mb4 COLLATE utf8mb4_bin NOT NULL;--> statement-breakpoint
ALTER TABLE `entries`
  MODIFY COLUMN `id` varchar(36) CHARACTER SET utf8mb4 COLLATE utf8mb4_bin NOT NULL,
  MODIFY COLUMN `event_id` varchar(36) CHARACTER SET utf8mb4 COLLATE utf8mb4_bin NOT NULL,
  MODIFY COLUMN `car_id` varchar(36) CHARACTER SET utf8mb4 COLLATE utf8mb4_bin NOT NULL,
  MODIFY COLUMN `declared_class` varchar(40) CHARACTER SET utf8mb4 COLLATE utf8mb4_bin NOT NULL,
  MODIFY COLUMN `driver_id` varchar(255) CHARACTER SET utf8mb4 COLLATE utf8mb4_bin NOT NULL,
  MODIFY COLUMN `co_driver_id` varchar(255) CHARACTER SET utf8mb4 COLLATE utf8mb4_bin;--> statement-breakpoint
ALTER TABLE `event_officials`
  MODIFY COLUMN `event_id` varchar(36) CHARACTER SET utf8mb4 COLLATE utf8mb4_bin NOT NULL,
  MODIFY COLUMN `user_id` varchar(255) CHARACTER SET utf8mb4 COLLATE utf8mb4_bin NOT NULL;--> statement-breakpoint
ALTER TABLE `event_pass_keys`
  MODIFY COLUMN `kid` varchar(64) CHARACTER SET utf8mb4 COLLATE utf8mb4_bin NOT NULL,
  MODIFY COLUMN `event_id` varchar(36) CHARACTER SET utf8mb4 COLLATE utf8mb4_bin NOT NULL,
  MODIFY COLUMN `public_key_x` varchar(64) CHARACTER SET utf8mb4 COLLATE utf8mb4_bin NOT NULL;--> statement-breakpoint
ALTER TABLE `events`
  MODIFY COLUMN `id` varchar(36) CHARACTER SET utf8mb4 COLLATE utf8mb4_bin NOT NULL,
  MODIFY COLUMN `club_id` varchar(36) CHARACTER SET utf8mb4 COLLATE utf8mb4_bin NOT NULL,
  MODIFY COLUMN `venue_id` varchar(36) CHARACTER SET utf8mb4 COLLATE utf8mb4_bin NOT NULL,
  MODIFY COLUMN `slug` varchar(80) CHARACTER SET utf8mb4 COLLATE utf8mb4_bin NOT NULL,
  MODIFY COLUMN `rule_set_version_id` varchar(36) CHARACTER SET utf8mb4 COLLATE utf8mb4_bin NOT NULL;--> statement-breakpoint
ALTER TABLE `mail_log`
  MODIFY COLUMN `event_id` varchar(36) CHARACTER SET utf8mb4 COLLATE utf8mb4_bin,
  MODIFY COLUMN `to_address` varchar(255) CHARACTER SET utf8mb4 COLLATE utf8mb4_bin NOT NULL,
  MODIFY COLUMN `message_id` varchar(255) CHARACTER SET utf8mb4 COLLATE utf8mb4_bin;--> statement-breakpoint
ALTER TABLE `passes`
  MODIFY COLUMN `id` varchar(36) CHARACTER SET utf8mb4 COLLATE utf8mb4_bin NOT NULL,
  MODIFY COLUMN `event_id` varchar(36) CHARACTER SET utf8mb4 COLLATE utf8mb4_bin NOT NULL,
  MODIFY COLUMN `entry_id` varchar(36) CHARACTER SET utf8mb4 COLLATE utf8mb4_bin NOT NULL,
  MODIFY COLUMN `kid` varchar(64) CHARACTER SET utf8mb4 COLLATE utf8mb4_bin NOT NULL,
  MODIFY COLUMN `token` text CHARACTER SET utf8mb4 COLLATE utf8mb4_bin NOT NULL,
  MODIFY COLUMN `revoked_by` varchar(255) CHARACTER SET utf8mb4 COLLATE utf8mb4_bin;--> statement-breakpoint
ALTER TABLE `payments`
  MODIFY COLUMN `id` varchar(36) CHARACTER SET utf8mb4 COLLATE utf8mb4_bin NOT NULL,
  MODIFY COLUMN `event_id` varchar(36) CHARACTER SET utf8mb4 COLLATE utf8mb4_bin NOT NULL,
  MODIFY COLUMN `entry_id` varchar(36) CHARACTER SET utf8mb4 COLLATE utf8mb4_bin NOT NULL,
  MODIFY COLUMN `provider` varchar(30) CHARACTER SET utf8mb4 COLLATE utf8mb4_bin NOT NULL,
  MODIFY COLUMN `provider_ref` varchar(120) CHARACTER SET utf8mb4 COLLATE utf8mb4_bin NOT NULL;--> statement-breakpoint
ALTER TABLE `records`
  MODIFY COLUMN `id` char(36) CHARACTER SET utf8mb4 COLLATE utf8mb4_bin NOT NULL,
  MODIFY COLUMN `event_id` varchar(36) CHARACTER SET utf8mb4 COLLATE utf8mb4_bin NOT NULL,
  MODIFY COLUMN `entry_id` varchar(36) CHARACTER SET utf8mb4 COLLATE utf8mb4_bin NOT NULL,
  MODIFY COLUMN `official_id` varchar(255) CHARACTER SET utf8mb4 COLLATE utf8mb4_bin NOT NULL,
  MODIFY COLUMN `device_id` varchar(64) CHARACTER SET utf8mb4 COLLATE utf8mb4_bin NOT NULL;--> statement-breakpoint
ALTER TABLE `rule_set_versions`
  MODIFY COLUMN `id` varchar(36) CHARACTER SET utf8mb4 COLLATE utf8mb4_bin NOT NULL,
  MODIFY COLUMN `rule_set_id` varchar(36) CHARACTER SET utf8mb4 COLLATE utf8mb4_bin NOT NULL,
  MODIFY COLUMN `created_by` varchar(255) CHARACTER SET utf8mb4 COLLATE utf8mb4_bin;--> statement-breakpoint
ALTER TABLE `rule_sets`
  MODIFY COLUMN `id` varchar(36) CHARACTER SET utf8mb4 COLLATE utf8mb4_bin NOT NULL,
  MODIFY COLUMN `club_id` varchar(36) CHARACTER SET utf8mb4 COLLATE utf8mb4_bin NOT NULL;--> statement-breakpoint
ALTER TABLE `run_group_publications`
  MODIFY COLUMN `id` varchar(36) CHARACTER SET utf8mb4 COLLATE utf8mb4_bin NOT NULL,
  MODIFY COLUMN `event_id` varchar(36) CHARACTER SET utf8mb4 COLLATE utf8mb4_bin NOT NULL,
  MODIFY COLUMN `published_by` varchar(255) CHARACTER SET utf8mb4 COLLATE utf8mb4_bin NOT NULL;--> statement-breakpoint
ALTER TABLE `sessions`
  MODIFY COLUMN `session_token` varchar(255) CHARACTER SET utf8mb4 COLLATE utf8mb4_bin NOT NULL,
  MODIFY COLUMN `user_id` varchar(255) CHARACTER SET utf8mb4 COLLATE utf8mb4_bin NOT NULL;--> statement-breakpoint
ALTER TABLE `uploads`
  MODIFY COLUMN `id` varchar(36) CHARACTER SET utf8mb4 COLLATE utf8mb4_bin NOT NULL,
  MODIFY COLUMN `event_id` varchar(36) CHARACTER SET utf8mb4 COLLATE utf8mb4_bin NOT NULL,
  MODIFY COLUMN `entry_id` varchar(36) CHARACTER SET utf8mb4 COLLATE utf8mb4_bin,
  MODIFY COLUMN `record_id` char(36) CHARACTER SET utf8mb4 COLLATE utf8mb4_bin,
  MODIFY COLUMN `bucket` varchar(63) CHARACTER SET utf8mb4 COLLATE utf8mb4_bin NOT NULL,
  MODIFY COLUMN `object_key` varchar(300) CHARACTER SET utf8mb4 COLLATE utf8mb4_bin NOT NULL,
  MODIFY COLUMN `sha256` char(64) CHARACTER SET utf8mb4 COLLATE utf8mb4_bin,
  MODIFY COLUMN `uploaded_by` varchar(255) CHARACTER SET utf8mb4 COLLATE utf8mb4_bin NOT NULL;--> statement-breakpoint
ALTER TABLE `users`
  MODIFY COLUMN `id` varchar(255) CHARACTER SET utf8mb4 COLLATE utf8mb4_bin NOT NULL,
  MODIFY COLUMN `email` varchar(255) CHARACTER SET utf8mb4 COLLATE utf8mb4_bin NOT NULL;--> statement-breakpoint
ALTER TABLE `venues`
  MODIFY COLUMN `id` varchar(36) CHARACTER SET utf8mb4 COLLATE utf8mb4_bin NOT NULL,
  MODIFY COLUMN `club_id` varchar(36) CHARACTER SET utf8mb4 COLLATE utf8mb4_bin NOT NULL;--> statement-breakpoint
ALTER TABLE `verdicts`
  MODIFY COLUMN `event_id` varchar(36) CHARACTER SET utf8mb4 COLLATE utf8mb4_bin NOT NULL,
  MODIFY COLUMN `entry_id` varchar(36) CHARACTER SET utf8mb4 COLLATE utf8mb4_bin NOT NULL,
  MODIFY COLUMN `final_class` varchar(40) CHARACTER SET utf8mb4 COLLATE utf8mb4_bin,
  MODIFY COLUMN `rule_set_version_id` varchar(36) CHARACTER SET utf8mb4 COLLATE utf8mb4_bin NOT NULL;--> statement-breakpoint
ALTER TABLE `verification_tokens`
  MODIFY COLUMN `identifier` varchar(255) CHARACTER SET utf8mb4 COLLATE utf8mb4_bin NOT NULL,
  MODIFY COLUMN `token` varchar(255) CHARACTER SET utf8mb4 COLLATE utf8mb4_bin NOT NULL;--> statement-breakpoint
ALTER TABLE `waivers`
  MODIFY COLUMN `id` varchar(36) CHARACTER SET utf8mb4 COLLATE utf8mb4_bin NOT NULL,
  MODIFY COLUMN `event_id` varchar(36) CHARACTER SET utf8mb4 COLLATE utf8mb4_bin NOT NULL,
  MODIFY COLUMN `entry_id` varchar(36) CHARACTER SET utf8mb4 COLLATE utf8mb4_bin NOT NULL,
  MODIFY COLUMN `signer_id` varchar(255) CHARACTER SET utf8mb4 COLLATE utf8mb4_bin NOT NULL;--> statement-breakpoint
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
ALTER TABLE `waivers` ADD CONSTRAINT `waivers_signer_id_users_id_fk` FOREIGN KEY (`signer_id`) REFERENCES `users`(`id`) ON DELETE no action ON UPDATE no action;
