CREATE TABLE `assumptions` (
	`id` int AUTO_INCREMENT NOT NULL,
	`engagement_id` int NOT NULL,
	`name` varchar(120) NOT NULL,
	`value` double NOT NULL,
	`unit` enum('per_second','per_minute','per_hour','per_day','seconds','minutes','hours','days','count','percent','fraction','currency_per_hour','number') NOT NULL,
	`source_kind` enum('dataset','client','judgement','published','other') NOT NULL,
	`source_detail` varchar(500) NOT NULL DEFAULT '',
	`owner_id` int,
	`notes` varchar(500) NOT NULL DEFAULT '',
	`created_at` datetime(3) NOT NULL,
	`updated_at` datetime(3) NOT NULL,
	`version` int NOT NULL DEFAULT 1,
	CONSTRAINT `assumptions_id` PRIMARY KEY(`id`),
	CONSTRAINT `assumptions_engagement_name_uq` UNIQUE(`engagement_id`,`name`)
);
--> statement-breakpoint
CREATE TABLE `studies` (
	`id` int AUTO_INCREMENT NOT NULL,
	`engagement_id` int NOT NULL,
	`title` varchar(200) NOT NULL,
	`status` enum('draft','in_review','changes_requested','approved','released') NOT NULL DEFAULT 'draft',
	`template_key` varchar(80),
	`document` json NOT NULL,
	`version` int NOT NULL DEFAULT 1,
	`created_by` int,
	`updated_by` int,
	`created_at` datetime(3) NOT NULL,
	`updated_at` datetime(3) NOT NULL,
	CONSTRAINT `studies_id` PRIMARY KEY(`id`)
);
--> statement-breakpoint
CREATE TABLE `study_block_assumptions` (
	`study_id` int NOT NULL,
	`block_id` varchar(40) NOT NULL,
	`assumption_id` int NOT NULL,
	CONSTRAINT `study_block_assumptions_study_id_block_id_assumption_id_pk` PRIMARY KEY(`study_id`,`block_id`,`assumption_id`)
);
--> statement-breakpoint
CREATE TABLE `study_blocks` (
	`study_id` int NOT NULL,
	`block_id` varchar(40) NOT NULL,
	`position` int NOT NULL,
	`title` varchar(200) NOT NULL DEFAULT '',
	`config` json NOT NULL,
	`resolved_spec` json,
	`result` json,
	`error` json,
	`scenarios` json NOT NULL,
	`chart` json,
	`engine_version` varchar(20) NOT NULL,
	`computed_at` datetime(3) NOT NULL,
	CONSTRAINT `study_blocks_study_id_block_id_pk` PRIMARY KEY(`study_id`,`block_id`)
);
--> statement-breakpoint
ALTER TABLE `assumptions` ADD CONSTRAINT `assumptions_engagement_id_engagements_id_fk` FOREIGN KEY (`engagement_id`) REFERENCES `engagements`(`id`) ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `assumptions` ADD CONSTRAINT `assumptions_owner_id_users_id_fk` FOREIGN KEY (`owner_id`) REFERENCES `users`(`id`) ON DELETE set null ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `studies` ADD CONSTRAINT `studies_engagement_id_engagements_id_fk` FOREIGN KEY (`engagement_id`) REFERENCES `engagements`(`id`) ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `studies` ADD CONSTRAINT `studies_created_by_users_id_fk` FOREIGN KEY (`created_by`) REFERENCES `users`(`id`) ON DELETE set null ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `studies` ADD CONSTRAINT `studies_updated_by_users_id_fk` FOREIGN KEY (`updated_by`) REFERENCES `users`(`id`) ON DELETE set null ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `study_block_assumptions` ADD CONSTRAINT `study_block_assumptions_assumption_id_assumptions_id_fk` FOREIGN KEY (`assumption_id`) REFERENCES `assumptions`(`id`) ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `study_block_assumptions` ADD CONSTRAINT `sba_block_fk` FOREIGN KEY (`study_id`,`block_id`) REFERENCES `study_blocks`(`study_id`,`block_id`) ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `study_blocks` ADD CONSTRAINT `study_blocks_study_id_studies_id_fk` FOREIGN KEY (`study_id`) REFERENCES `studies`(`id`) ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
CREATE INDEX `studies_engagement_idx` ON `studies` (`engagement_id`,`updated_at`);--> statement-breakpoint
CREATE INDEX `sba_assumption_idx` ON `study_block_assumptions` (`assumption_id`);