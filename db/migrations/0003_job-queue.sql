CREATE TABLE `jobs` (
	`id` bigint unsigned AUTO_INCREMENT NOT NULL,
	`kind` varchar(40) CHARACTER SET utf8mb4 COLLATE utf8mb4_bin NOT NULL,
	`dedupe_key` varchar(255) CHARACTER SET utf8mb4 COLLATE utf8mb4_bin,
	`payload` json NOT NULL,
	`status` enum('queued','running','done','failed') NOT NULL DEFAULT 'queued',
	`attempts` int NOT NULL DEFAULT 0,
	`run_after` datetime(3) NOT NULL,
	`locked_until` datetime(3),
	`lease_token` varchar(36) CHARACTER SET utf8mb4 COLLATE utf8mb4_bin,
	`last_error` varchar(1000),
	`created_at` datetime(3) NOT NULL,
	`done_at` datetime(3),
	CONSTRAINT `jobs_id` PRIMARY KEY(`id`),
	CONSTRAINT `jobs_dedupe_idx` UNIQUE(`dedupe_key`)
);
--> statement-breakpoint
ALTER TABLE `mail_log` ADD `job_id` bigint unsigned;--> statement-breakpoint
ALTER TABLE `verdicts` ADD `result_hash` varchar(64) CHARACTER SET utf8mb4 COLLATE utf8mb4_bin;--> statement-breakpoint
ALTER TABLE `mail_log` ADD CONSTRAINT `mail_log_job_sent_idx` UNIQUE(`job_id`);--> statement-breakpoint
CREATE INDEX `jobs_due_idx` ON `jobs` (`status`,`kind`,`run_after`);