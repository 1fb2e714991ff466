CREATE TABLE `aero_plans` (
	`id` varchar(36) CHARACTER SET utf8mb4 COLLATE utf8mb4_bin NOT NULL,
	`owner_id` varchar(255) CHARACTER SET utf8mb4 COLLATE utf8mb4_bin NOT NULL,
	`car_id` varchar(36) CHARACTER SET utf8mb4 COLLATE utf8mb4_bin NOT NULL,
	`name` varchar(80) NOT NULL,
	`plan` json NOT NULL,
	`created_at` datetime(3) NOT NULL,
	`updated_at` datetime(3) NOT NULL,
	CONSTRAINT `aero_plans_id` PRIMARY KEY(`id`)
);
--> statement-breakpoint
CREATE TABLE `car_files` (
	`id` varchar(36) CHARACTER SET utf8mb4 COLLATE utf8mb4_bin NOT NULL,
	`car_id` varchar(36) CHARACTER SET utf8mb4 COLLATE utf8mb4_bin NOT NULL,
	`kind` enum('front','side','rear','dyno-sheet') NOT NULL,
	`bucket` varchar(63) CHARACTER SET utf8mb4 COLLATE utf8mb4_bin NOT NULL,
	`object_key` varchar(300) CHARACTER SET utf8mb4 COLLATE utf8mb4_bin NOT NULL,
	`content_type` varchar(100) NOT NULL,
	`byte_size` int NOT NULL,
	`width_px` smallint,
	`height_px` smallint,
	`sha256` char(64) CHARACTER SET utf8mb4 COLLATE utf8mb4_bin NOT NULL,
	`uploaded_by` varchar(255) CHARACTER SET utf8mb4 COLLATE utf8mb4_bin NOT NULL,
	`created_at` datetime(3) NOT NULL,
	`removed_at` datetime(3),
	CONSTRAINT `car_files_id` PRIMARY KEY(`id`),
	CONSTRAINT `car_files_object_unique` UNIQUE(`bucket`,`object_key`)
);
--> statement-breakpoint
CREATE TABLE `co_driver_invites` (
	`id` varchar(36) CHARACTER SET utf8mb4 COLLATE utf8mb4_bin NOT NULL,
	`entry_id` varchar(36) CHARACTER SET utf8mb4 COLLATE utf8mb4_bin NOT NULL,
	`email` varchar(255) CHARACTER SET utf8mb4 COLLATE utf8mb4_bin NOT NULL,
	`token_hash` char(64) CHARACTER SET utf8mb4 COLLATE utf8mb4_bin NOT NULL,
	`invited_by` varchar(255) CHARACTER SET utf8mb4 COLLATE utf8mb4_bin NOT NULL,
	`created_at` datetime(3) NOT NULL,
	`expires_at` datetime(3) NOT NULL,
	`accepted_at` datetime(3),
	`accepted_by` varchar(255) CHARACTER SET utf8mb4 COLLATE utf8mb4_bin,
	`closed_at` datetime(3),
	CONSTRAINT `co_driver_invites_id` PRIMARY KEY(`id`),
	CONSTRAINT `co_driver_invites_token_unique` UNIQUE(`token_hash`)
);
--> statement-breakpoint
CREATE TABLE `payment_webhook_events` (
	`provider_event_id` varchar(120) CHARACTER SET utf8mb4 COLLATE utf8mb4_bin NOT NULL,
	`provider` varchar(30) CHARACTER SET utf8mb4 COLLATE utf8mb4_bin NOT NULL,
	`type` varchar(80) NOT NULL,
	`received_at` datetime(3) NOT NULL,
	CONSTRAINT `payment_webhook_events_provider_event_id` PRIMARY KEY(`provider_event_id`)
);
--> statement-breakpoint
ALTER TABLE `entries` MODIFY COLUMN `status` enum('entered','waiting','withdrawn') NOT NULL DEFAULT 'entered';--> statement-breakpoint
ALTER TABLE `payments` MODIFY COLUMN `status` enum('pending','paid','failed','cancelled','refunded') NOT NULL;--> statement-breakpoint
ALTER TABLE `cars` ADD `body_width_mm` double;--> statement-breakpoint
ALTER TABLE `cars` ADD `roof_height_mm` double;--> statement-breakpoint
ALTER TABLE `cars` ADD `retired_at` datetime(3);--> statement-breakpoint
ALTER TABLE `entries` ADD `waiting_seq` int;--> statement-breakpoint
ALTER TABLE `entries` ADD `withdrawn_at` datetime(3);--> statement-breakpoint
ALTER TABLE `events` ADD `entries_open_at` datetime(3);--> statement-breakpoint
ALTER TABLE `events` ADD `entries_close_at` datetime(3);--> statement-breakpoint
ALTER TABLE `events` ADD `waiver_text` text;--> statement-breakpoint
ALTER TABLE `events` ADD `waiver_version` varchar(40);--> statement-breakpoint
ALTER TABLE `events` ADD `refund_policy` json;--> statement-breakpoint
ALTER TABLE `payments` ADD `payment_ref` varchar(120) CHARACTER SET utf8mb4 COLLATE utf8mb4_bin;--> statement-breakpoint
ALTER TABLE `payments` ADD `paid_at` datetime(3);--> statement-breakpoint
ALTER TABLE `payments` ADD `refunded_minor` int DEFAULT 0 NOT NULL;--> statement-breakpoint
ALTER TABLE `users` ADD `date_of_birth` date;--> statement-breakpoint
ALTER TABLE `users` ADD `phone` varchar(40);--> statement-breakpoint
ALTER TABLE `users` ADD `emergency_contact_name` varchar(160);--> statement-breakpoint
ALTER TABLE `users` ADD `emergency_contact_phone` varchar(40);--> statement-breakpoint
ALTER TABLE `users` ADD `licence` varchar(80);--> statement-breakpoint
ALTER TABLE `users` ADD `experience_level` enum('novice','intermediate','advanced','expert');--> statement-breakpoint
ALTER TABLE `users` ADD `profile_updated_at` datetime(3);--> statement-breakpoint
ALTER TABLE `waivers` ADD `signer_ip` varchar(45);--> statement-breakpoint
ALTER TABLE `waivers` ADD `guardian_email` varchar(255) CHARACTER SET utf8mb4 COLLATE utf8mb4_bin;--> statement-breakpoint
ALTER TABLE `waivers` ADD `guardian_token_hash` char(64) CHARACTER SET utf8mb4 COLLATE utf8mb4_bin;--> statement-breakpoint
ALTER TABLE `waivers` ADD `guardian_requested_at` datetime(3);--> statement-breakpoint
ALTER TABLE `waivers` ADD `guardian_ip` varchar(45);--> statement-breakpoint
ALTER TABLE `waivers` ADD CONSTRAINT `waivers_guardian_token_unique` UNIQUE(`guardian_token_hash`);--> statement-breakpoint
ALTER TABLE `aero_plans` ADD CONSTRAINT `aero_plans_owner_id_users_id_fk` FOREIGN KEY (`owner_id`) REFERENCES `users`(`id`) ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `aero_plans` ADD CONSTRAINT `aero_plans_car_id_cars_id_fk` FOREIGN KEY (`car_id`) REFERENCES `cars`(`id`) ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `car_files` ADD CONSTRAINT `car_files_car_id_cars_id_fk` FOREIGN KEY (`car_id`) REFERENCES `cars`(`id`) ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `car_files` ADD CONSTRAINT `car_files_uploaded_by_users_id_fk` FOREIGN KEY (`uploaded_by`) REFERENCES `users`(`id`) ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `co_driver_invites` ADD CONSTRAINT `co_driver_invites_entry_id_entries_id_fk` FOREIGN KEY (`entry_id`) REFERENCES `entries`(`id`) ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `co_driver_invites` ADD CONSTRAINT `co_driver_invites_invited_by_users_id_fk` FOREIGN KEY (`invited_by`) REFERENCES `users`(`id`) ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `co_driver_invites` ADD CONSTRAINT `co_driver_invites_accepted_by_users_id_fk` FOREIGN KEY (`accepted_by`) REFERENCES `users`(`id`) ON DELETE no action ON UPDATE no action;--> statement-breakpoint
CREATE INDEX `aero_plans_car_idx` ON `aero_plans` (`car_id`);--> statement-breakpoint
CREATE INDEX `aero_plans_owner_idx` ON `aero_plans` (`owner_id`);--> statement-breakpoint
CREATE INDEX `car_files_car_idx` ON `car_files` (`car_id`);--> statement-breakpoint
CREATE INDEX `co_driver_invites_entry_idx` ON `co_driver_invites` (`entry_id`);