CREATE TABLE `briefings` (
	`id` varchar(36) NOT NULL,
	`organisation_id` varchar(36) NOT NULL,
	`community_id` varchar(36) NOT NULL,
	`public_id` varchar(32) NOT NULL,
	`created_by_user_id` varchar(255),
	`created_at` timestamp(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(3),
	`updated_at` timestamp(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(3),
	CONSTRAINT `briefings_id` PRIMARY KEY(`id`),
	CONSTRAINT `briefings_public_id_unique` UNIQUE(`public_id`)
);
--> statement-breakpoint
CREATE TABLE `briefing_versions` (
	`id` varchar(36) NOT NULL,
	`briefing_id` varchar(36) NOT NULL,
	`version` int NOT NULL,
	`state` enum('draft','in_review','published','superseded') NOT NULL DEFAULT 'draft',
	`outlook_ids` json NOT NULL,
	`numbers_sha256` varchar(64) NOT NULL,
	`published_at` timestamp(3),
	`published_by_user_id` varchar(255),
	`created_at` timestamp(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(3),
	`updated_at` timestamp(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(3),
	CONSTRAINT `briefing_versions_id` PRIMARY KEY(`id`),
	CONSTRAINT `briefing_versions_briefing_version_unique` UNIQUE(`briefing_id`,`version`)
);
--> statement-breakpoint
CREATE TABLE `briefing_languages` (
	`id` varchar(36) NOT NULL,
	`version_id` varchar(36) NOT NULL,
	`lang` varchar(35) NOT NULL,
	`state` enum('draft','in_review','approved') NOT NULL DEFAULT 'draft',
	`shipped` boolean NOT NULL DEFAULT true,
	`approved_at` timestamp(3),
	`approved_by_user_id` varchar(255),
	`created_at` timestamp(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(3),
	`updated_at` timestamp(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(3),
	CONSTRAINT `briefing_languages_id` PRIMARY KEY(`id`),
	CONSTRAINT `briefing_languages_version_lang_unique` UNIQUE(`version_id`,`lang`)
);
--> statement-breakpoint
CREATE TABLE `briefing_strings` (
	`id` varchar(36) NOT NULL,
	`version_id` varchar(36) NOT NULL,
	`lang` varchar(35) NOT NULL,
	`key` varchar(120) NOT NULL,
	`generated` text NOT NULL,
	`correction` text,
	`numbers_sha256` varchar(64) NOT NULL,
	`corrected_by_user_id` varchar(255),
	`created_at` timestamp(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(3),
	`updated_at` timestamp(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(3),
	CONSTRAINT `briefing_strings_id` PRIMARY KEY(`id`),
	CONSTRAINT `briefing_strings_version_lang_key_unique` UNIQUE(`version_id`,`lang`,`key`)
);
--> statement-breakpoint
ALTER TABLE `briefings` ADD CONSTRAINT `briefings_organisation_id_organisations_id_fk` FOREIGN KEY (`organisation_id`) REFERENCES `organisations`(`id`) ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `briefings` ADD CONSTRAINT `briefings_community_id_communities_id_fk` FOREIGN KEY (`community_id`) REFERENCES `communities`(`id`) ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `briefings` ADD CONSTRAINT `briefings_created_by_user_id_users_id_fk` FOREIGN KEY (`created_by_user_id`) REFERENCES `users`(`id`) ON DELETE set null ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `briefing_versions` ADD CONSTRAINT `briefing_versions_briefing_id_briefings_id_fk` FOREIGN KEY (`briefing_id`) REFERENCES `briefings`(`id`) ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `briefing_versions` ADD CONSTRAINT `briefing_versions_published_by_user_id_users_id_fk` FOREIGN KEY (`published_by_user_id`) REFERENCES `users`(`id`) ON DELETE set null ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `briefing_languages` ADD CONSTRAINT `briefing_languages_version_id_briefing_versions_id_fk` FOREIGN KEY (`version_id`) REFERENCES `briefing_versions`(`id`) ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `briefing_languages` ADD CONSTRAINT `briefing_languages_approved_by_user_id_users_id_fk` FOREIGN KEY (`approved_by_user_id`) REFERENCES `users`(`id`) ON DELETE set null ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `briefing_strings` ADD CONSTRAINT `briefing_strings_version_id_briefing_versions_id_fk` FOREIGN KEY (`version_id`) REFERENCES `briefing_versions`(`id`) ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `briefing_strings` ADD CONSTRAINT `briefing_strings_corrected_by_user_id_users_id_fk` FOREIGN KEY (`corrected_by_user_id`) REFERENCES `users`(`id`) ON DELETE set null ON UPDATE no action;--> statement-breakpoint
CREATE INDEX `briefings_org_community_idx` ON `briefings` (`organisation_id`,`community_id`);--> statement-breakpoint
CREATE INDEX `briefing_versions_state_idx` ON `briefing_versions` (`state`);