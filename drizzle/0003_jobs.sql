CREATE TABLE `jobs` (
	`id` varchar(36) NOT NULL,
	`kind` varchar(40) NOT NULL,
	`organisation_id` varchar(36),
	`payload` json NOT NULL,
	`input_sha256` varchar(64),
	`dedupe_key` varchar(191),
	`state` enum('queued','running','succeeded','failed','cancelled') NOT NULL DEFAULT 'queued',
	`attempts` int NOT NULL DEFAULT 0,
	`max_attempts` int NOT NULL DEFAULT 3,
	`progress` double NOT NULL DEFAULT 0,
	`stage` varchar(40),
	`result` json,
	`error` text,
	`run_after` timestamp(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(3),
	`locked_by` varchar(120),
	`lease_expires_at` timestamp(3),
	`started_at` timestamp(3),
	`finished_at` timestamp(3),
	`created_by_user_id` varchar(255),
	`created_at` timestamp(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(3),
	`updated_at` timestamp(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(3),
	CONSTRAINT `jobs_id` PRIMARY KEY(`id`),
	CONSTRAINT `jobs_dedupe_unique` UNIQUE(`dedupe_key`)
);
--> statement-breakpoint
ALTER TABLE `jobs` ADD CONSTRAINT `jobs_organisation_id_organisations_id_fk` FOREIGN KEY (`organisation_id`) REFERENCES `organisations`(`id`) ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `jobs` ADD CONSTRAINT `jobs_created_by_user_id_users_id_fk` FOREIGN KEY (`created_by_user_id`) REFERENCES `users`(`id`) ON DELETE set null ON UPDATE no action;--> statement-breakpoint
CREATE INDEX `jobs_claim_idx` ON `jobs` (`state`,`run_after`);--> statement-breakpoint
CREATE INDEX `jobs_lease_idx` ON `jobs` (`state`,`lease_expires_at`);--> statement-breakpoint
CREATE INDEX `jobs_org_kind_idx` ON `jobs` (`organisation_id`,`kind`);