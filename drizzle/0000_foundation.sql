CREATE TABLE `access_tokens` (
	`id` int AUTO_INCREMENT NOT NULL,
	`user_id` int NOT NULL,
	`purpose` enum('invitation','password_reset') NOT NULL,
	`token_hash` varchar(64) NOT NULL,
	`expires_at` datetime(3) NOT NULL,
	`used_at` datetime(3),
	`created_at` datetime(3) NOT NULL,
	CONSTRAINT `access_tokens_id` PRIMARY KEY(`id`),
	CONSTRAINT `access_tokens_hash_uq` UNIQUE(`token_hash`)
);
--> statement-breakpoint
CREATE TABLE `users` (
	`id` int AUTO_INCREMENT NOT NULL,
	`email` varchar(254) NOT NULL,
	`name` varchar(120) NOT NULL,
	`role` enum('admin','partner','consultant','client') NOT NULL,
	`password_hash` varchar(255),
	`status` enum('invited','active','deactivated') NOT NULL DEFAULT 'invited',
	`created_at` datetime(3) NOT NULL,
	`last_sign_in_at` datetime(3),
	`version` int NOT NULL DEFAULT 1,
	CONSTRAINT `users_id` PRIMARY KEY(`id`),
	CONSTRAINT `users_email_uq` UNIQUE(`email`)
);
--> statement-breakpoint
CREATE TABLE `engagements` (
	`id` int AUTO_INCREMENT NOT NULL,
	`name` varchar(160) NOT NULL,
	`client_name` varchar(160) NOT NULL,
	`description` text NOT NULL,
	`status` enum('active','archived') NOT NULL DEFAULT 'active',
	`safety_critical` boolean NOT NULL DEFAULT false,
	`created_at` datetime(3) NOT NULL,
	`updated_at` datetime(3) NOT NULL,
	`version` int NOT NULL DEFAULT 1,
	CONSTRAINT `engagements_id` PRIMARY KEY(`id`)
);
--> statement-breakpoint
CREATE TABLE `memberships` (
	`engagement_id` int NOT NULL,
	`user_id` int NOT NULL,
	`added_at` datetime(3) NOT NULL,
	CONSTRAINT `memberships_engagement_id_user_id_pk` PRIMARY KEY(`engagement_id`,`user_id`)
);
--> statement-breakpoint
CREATE TABLE `audit_entries` (
	`id` bigint AUTO_INCREMENT NOT NULL,
	`at` datetime(3) NOT NULL,
	`action` varchar(64) NOT NULL,
	`actor_id` int,
	`actor_email` varchar(254),
	`engagement_id` int,
	`subject` varchar(300),
	`detail` json,
	`ip` varchar(64),
	CONSTRAINT `audit_entries_id` PRIMARY KEY(`id`)
);
--> statement-breakpoint
CREATE TABLE `sessions` (
	`session_id` varchar(128) NOT NULL,
	`expires` int unsigned NOT NULL,
	`data` mediumtext,
	CONSTRAINT `sessions_session_id` PRIMARY KEY(`session_id`)
);
--> statement-breakpoint
ALTER TABLE `access_tokens` ADD CONSTRAINT `access_tokens_user_id_users_id_fk` FOREIGN KEY (`user_id`) REFERENCES `users`(`id`) ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `memberships` ADD CONSTRAINT `memberships_engagement_id_engagements_id_fk` FOREIGN KEY (`engagement_id`) REFERENCES `engagements`(`id`) ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `memberships` ADD CONSTRAINT `memberships_user_id_users_id_fk` FOREIGN KEY (`user_id`) REFERENCES `users`(`id`) ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
CREATE INDEX `access_tokens_user_idx` ON `access_tokens` (`user_id`);--> statement-breakpoint
CREATE INDEX `memberships_user_idx` ON `memberships` (`user_id`);--> statement-breakpoint
CREATE INDEX `audit_at_idx` ON `audit_entries` (`at`);--> statement-breakpoint
CREATE INDEX `audit_action_idx` ON `audit_entries` (`action`);--> statement-breakpoint
CREATE INDEX `audit_actor_idx` ON `audit_entries` (`actor_id`);--> statement-breakpoint
CREATE INDEX `audit_engagement_idx` ON `audit_entries` (`engagement_id`);