CREATE TABLE `datasets` (
	`id` int AUTO_INCREMENT NOT NULL,
	`engagement_id` int NOT NULL,
	`name` varchar(200) NOT NULL,
	`object_key` varchar(200) NOT NULL,
	`byte_size` bigint NOT NULL,
	`sha256` char(64) NOT NULL,
	`detected_delimiter` enum('comma','tab','semicolon','pipe') NOT NULL,
	`header` json NOT NULL,
	`preview` json NOT NULL,
	`status` enum('uploaded','mapped','fitting','fitted','failed') NOT NULL DEFAULT 'uploaded',
	`mapping` json,
	`progress` double NOT NULL DEFAULT 0,
	`rows_read` int NOT NULL DEFAULT 0,
	`problem` json,
	`fit` json,
	`job_token` char(32),
	`heartbeat_at` datetime(3),
	`fitted_at` datetime(3),
	`uploaded_by` int,
	`created_at` datetime(3) NOT NULL,
	`updated_at` datetime(3) NOT NULL,
	CONSTRAINT `datasets_id` PRIMARY KEY(`id`)
);
--> statement-breakpoint
ALTER TABLE `datasets` ADD CONSTRAINT `datasets_engagement_id_engagements_id_fk` FOREIGN KEY (`engagement_id`) REFERENCES `engagements`(`id`) ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `datasets` ADD CONSTRAINT `datasets_uploaded_by_users_id_fk` FOREIGN KEY (`uploaded_by`) REFERENCES `users`(`id`) ON DELETE set null ON UPDATE no action;--> statement-breakpoint
CREATE INDEX `datasets_engagement_idx` ON `datasets` (`engagement_id`,`created_at`);--> statement-breakpoint
CREATE INDEX `datasets_status_idx` ON `datasets` (`status`);