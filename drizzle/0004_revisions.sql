CREATE TABLE `releases` (
	`id` int AUTO_INCREMENT NOT NULL,
	`revision_id` int NOT NULL,
	`status` enum('releasing','released','failed') NOT NULL,
	`attempts` int NOT NULL DEFAULT 0,
	`last_error` varchar(500),
	`lease_until` datetime(3),
	`s3_key` varchar(300),
	`file_sha256` char(64),
	`file_size` bigint,
	`released_at` datetime(3),
	`released_by` int,
	`updated_at` datetime(3) NOT NULL,
	CONSTRAINT `releases_id` PRIMARY KEY(`id`),
	CONSTRAINT `releases_revision_uq` UNIQUE(`revision_id`)
);
--> statement-breakpoint
CREATE TABLE `revision_comments` (
	`id` int AUTO_INCREMENT NOT NULL,
	`revision_id` int NOT NULL,
	`anchor_type` enum('section','block','general') NOT NULL,
	`anchor_id` varchar(40),
	`parent_id` int,
	`author_id` int,
	`body` text NOT NULL,
	`resolved_at` datetime(3),
	`resolved_by` int,
	`created_at` datetime(3) NOT NULL,
	CONSTRAINT `revision_comments_id` PRIMARY KEY(`id`)
);
--> statement-breakpoint
CREATE TABLE `revisions` (
	`id` int AUTO_INCREMENT NOT NULL,
	`study_id` int NOT NULL,
	`number` int NOT NULL,
	`status` enum('in_review','changes_requested','approved','released') NOT NULL,
	`snapshot` json NOT NULL,
	`sha256` char(64) NOT NULL,
	`engine_version` varchar(20) NOT NULL,
	`submitted_by` int,
	`submitted_at` datetime(3) NOT NULL,
	`decided_by` int,
	`decided_at` datetime(3),
	`decision_reason` text,
	`released_at` datetime(3),
	`version` int NOT NULL DEFAULT 1,
	CONSTRAINT `revisions_id` PRIMARY KEY(`id`),
	CONSTRAINT `revisions_study_number_uq` UNIQUE(`study_id`,`number`)
);
--> statement-breakpoint
ALTER TABLE `releases` ADD CONSTRAINT `releases_revision_id_revisions_id_fk` FOREIGN KEY (`revision_id`) REFERENCES `revisions`(`id`) ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `releases` ADD CONSTRAINT `releases_released_by_users_id_fk` FOREIGN KEY (`released_by`) REFERENCES `users`(`id`) ON DELETE set null ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `revision_comments` ADD CONSTRAINT `revision_comments_revision_id_revisions_id_fk` FOREIGN KEY (`revision_id`) REFERENCES `revisions`(`id`) ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `revision_comments` ADD CONSTRAINT `revision_comments_author_id_users_id_fk` FOREIGN KEY (`author_id`) REFERENCES `users`(`id`) ON DELETE set null ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `revision_comments` ADD CONSTRAINT `revision_comments_resolved_by_users_id_fk` FOREIGN KEY (`resolved_by`) REFERENCES `users`(`id`) ON DELETE set null ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `revisions` ADD CONSTRAINT `revisions_study_id_studies_id_fk` FOREIGN KEY (`study_id`) REFERENCES `studies`(`id`) ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `revisions` ADD CONSTRAINT `revisions_submitted_by_users_id_fk` FOREIGN KEY (`submitted_by`) REFERENCES `users`(`id`) ON DELETE set null ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `revisions` ADD CONSTRAINT `revisions_decided_by_users_id_fk` FOREIGN KEY (`decided_by`) REFERENCES `users`(`id`) ON DELETE set null ON UPDATE no action;--> statement-breakpoint
CREATE INDEX `releases_file_sha_idx` ON `releases` (`file_sha256`);--> statement-breakpoint
CREATE INDEX `revision_comments_revision_idx` ON `revision_comments` (`revision_id`,`created_at`);--> statement-breakpoint
CREATE INDEX `revision_comments_parent_idx` ON `revision_comments` (`parent_id`);--> statement-breakpoint
CREATE INDEX `revisions_status_idx` ON `revisions` (`status`);--> statement-breakpoint
CREATE INDEX `revisions_sha_idx` ON `revisions` (`sha256`);