CREATE TABLE `outlooks` (
	`id` varchar(36) NOT NULL,
	`profile_version_id` varchar(36) NOT NULL,
	`organisation_id` varchar(36) NOT NULL,
	`scenarios` json NOT NULL,
	`horizons` json NOT NULL,
	`input_sha256` varchar(64) NOT NULL,
	`engine_version` varchar(32) NOT NULL,
	`result` json NOT NULL,
	`computed_by_user_id` varchar(255),
	`created_at` timestamp(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(3),
	`updated_at` timestamp(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(3),
	CONSTRAINT `outlooks_id` PRIMARY KEY(`id`),
	CONSTRAINT `outlooks_org_input_engine_unique` UNIQUE(`organisation_id`,`input_sha256`,`engine_version`)
);
--> statement-breakpoint
ALTER TABLE `outlooks` ADD CONSTRAINT `outlooks_profile_version_id_ground_profile_versions_id_fk` FOREIGN KEY (`profile_version_id`) REFERENCES `ground_profile_versions`(`id`) ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `outlooks` ADD CONSTRAINT `outlooks_organisation_id_organisations_id_fk` FOREIGN KEY (`organisation_id`) REFERENCES `organisations`(`id`) ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `outlooks` ADD CONSTRAINT `outlooks_computed_by_user_id_users_id_fk` FOREIGN KEY (`computed_by_user_id`) REFERENCES `users`(`id`) ON DELETE set null ON UPDATE no action;--> statement-breakpoint
CREATE INDEX `outlooks_profile_version_idx` ON `outlooks` (`profile_version_id`);