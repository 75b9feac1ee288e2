CREATE TABLE `fields` (
	`id` char(36) NOT NULL,
	`workspace_id` char(36) NOT NULL,
	`name` varchar(120) NOT NULL,
	`crop` varchar(120) NOT NULL,
	`planting_year` int,
	`notes` text NOT NULL,
	`setting` longtext NOT NULL,
	`created_at` datetime(3) NOT NULL,
	`updated_at` datetime(3) NOT NULL,
	CONSTRAINT `fields_id` PRIMARY KEY(`id`)
);
--> statement-breakpoint
CREATE TABLE `projections` (
	`id` char(36) NOT NULL,
	`workspace_id` char(36) NOT NULL,
	`scenario_id` char(36),
	`batch_id` char(36) NOT NULL,
	`strategy_id` char(36),
	`label` varchar(200) NOT NULL,
	`role` enum('strategy','baseline','let-it-seed') NOT NULL,
	`let_it_seed_year` int,
	`snapshot` longtext NOT NULL,
	`seed` int unsigned NOT NULL,
	`replicates` int NOT NULL,
	`status` enum('queued','running','done','failed','cancelled') NOT NULL,
	`replicates_done` int NOT NULL DEFAULT 0,
	`error` text,
	`result` longtext,
	`created_by` char(36),
	`queued_at` datetime(3) NOT NULL,
	`started_at` datetime(3),
	`finished_at` datetime(3),
	CONSTRAINT `projections_id` PRIMARY KEY(`id`)
);
--> statement-breakpoint
CREATE TABLE `scenarios` (
	`id` char(36) NOT NULL,
	`workspace_id` char(36) NOT NULL,
	`name` varchar(120) NOT NULL,
	`field_id` char(36) NOT NULL,
	`profile_id` char(36) NOT NULL,
	`strategy_ids` longtext NOT NULL,
	`horizon_years` int NOT NULL,
	`replicates` int NOT NULL,
	`seed` int unsigned NOT NULL,
	`efficacy_draw` enum('per-replicate','per-application') NOT NULL,
	`depletion_threshold` double NOT NULL,
	`discount_rate` double NOT NULL,
	`created_at` datetime(3) NOT NULL,
	`updated_at` datetime(3) NOT NULL,
	CONSTRAINT `scenarios_id` PRIMARY KEY(`id`)
);
--> statement-breakpoint
CREATE TABLE `species_profiles` (
	`id` char(36) NOT NULL,
	`workspace_id` char(36),
	`name` varchar(120) NOT NULL,
	`built_in` boolean NOT NULL DEFAULT false,
	`profile` longtext NOT NULL,
	`sources` longtext NOT NULL,
	`copied_from` char(36),
	`created_at` datetime(3) NOT NULL,
	`updated_at` datetime(3) NOT NULL,
	CONSTRAINT `species_profiles_id` PRIMARY KEY(`id`)
);
--> statement-breakpoint
CREATE TABLE `strategies` (
	`id` char(36) NOT NULL,
	`workspace_id` char(36) NOT NULL,
	`field_id` char(36),
	`name` varchar(120) NOT NULL,
	`description` text NOT NULL,
	`steps` longtext NOT NULL,
	`max_rates` longtext NOT NULL,
	`created_at` datetime(3) NOT NULL,
	`updated_at` datetime(3) NOT NULL,
	CONSTRAINT `strategies_id` PRIMARY KEY(`id`)
);
--> statement-breakpoint
ALTER TABLE `fields` ADD CONSTRAINT `fields_workspace_id_workspaces_id_fk` FOREIGN KEY (`workspace_id`) REFERENCES `workspaces`(`id`) ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `projections` ADD CONSTRAINT `projections_workspace_id_workspaces_id_fk` FOREIGN KEY (`workspace_id`) REFERENCES `workspaces`(`id`) ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `projections` ADD CONSTRAINT `projections_scenario_id_scenarios_id_fk` FOREIGN KEY (`scenario_id`) REFERENCES `scenarios`(`id`) ON DELETE set null ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `projections` ADD CONSTRAINT `projections_created_by_users_id_fk` FOREIGN KEY (`created_by`) REFERENCES `users`(`id`) ON DELETE set null ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `scenarios` ADD CONSTRAINT `scenarios_workspace_id_workspaces_id_fk` FOREIGN KEY (`workspace_id`) REFERENCES `workspaces`(`id`) ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `scenarios` ADD CONSTRAINT `scenarios_field_id_fields_id_fk` FOREIGN KEY (`field_id`) REFERENCES `fields`(`id`) ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `scenarios` ADD CONSTRAINT `scenarios_profile_id_species_profiles_id_fk` FOREIGN KEY (`profile_id`) REFERENCES `species_profiles`(`id`) ON DELETE restrict ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `species_profiles` ADD CONSTRAINT `species_profiles_workspace_id_workspaces_id_fk` FOREIGN KEY (`workspace_id`) REFERENCES `workspaces`(`id`) ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `strategies` ADD CONSTRAINT `strategies_workspace_id_workspaces_id_fk` FOREIGN KEY (`workspace_id`) REFERENCES `workspaces`(`id`) ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `strategies` ADD CONSTRAINT `strategies_field_id_fields_id_fk` FOREIGN KEY (`field_id`) REFERENCES `fields`(`id`) ON DELETE set null ON UPDATE no action;--> statement-breakpoint
CREATE INDEX `fields_workspace` ON `fields` (`workspace_id`,`name`);--> statement-breakpoint
CREATE INDEX `projections_workspace` ON `projections` (`workspace_id`,`queued_at`);--> statement-breakpoint
CREATE INDEX `projections_batch` ON `projections` (`batch_id`);--> statement-breakpoint
CREATE INDEX `projections_status` ON `projections` (`status`);--> statement-breakpoint
CREATE INDEX `scenarios_workspace` ON `scenarios` (`workspace_id`,`updated_at`);--> statement-breakpoint
CREATE INDEX `profiles_workspace` ON `species_profiles` (`workspace_id`,`name`);--> statement-breakpoint
CREATE INDEX `strategies_workspace` ON `strategies` (`workspace_id`,`name`);