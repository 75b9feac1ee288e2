CREATE TABLE `invitations` (
	`id` char(36) NOT NULL,
	`workspace_id` char(36) NOT NULL,
	`email` varchar(254) NOT NULL,
	`role` enum('owner','editor','viewer') NOT NULL,
	`token_hash` char(64) NOT NULL,
	`invited_by` char(36),
	`created_at` datetime(3) NOT NULL,
	`sent_at` datetime(3) NOT NULL,
	`expires_at` datetime(3) NOT NULL,
	`accepted_at` datetime(3),
	`accepted_by` char(36),
	`revoked_at` datetime(3),
	CONSTRAINT `invitations_id` PRIMARY KEY(`id`),
	CONSTRAINT `invitations_token_hash_unique` UNIQUE(`token_hash`)
);
--> statement-breakpoint
CREATE TABLE `card_photos` (
	`id` char(36) NOT NULL,
	`card_id` char(36) NOT NULL,
	`caption` varchar(200) NOT NULL,
	`content_type` enum('image/jpeg','image/png') NOT NULL,
	`width` int NOT NULL,
	`height` int NOT NULL,
	`bytes` int NOT NULL,
	`sha256` char(64) NOT NULL,
	`data` longblob NOT NULL,
	`created_at` datetime(3) NOT NULL,
	CONSTRAINT `card_photos_id` PRIMARY KEY(`id`)
);
--> statement-breakpoint
CREATE TABLE `lesson_links` (
	`id` char(36) NOT NULL,
	`lesson_id` char(36) NOT NULL,
	`token_hash` char(64) NOT NULL,
	`prefix` varchar(12) NOT NULL,
	`revoked` boolean NOT NULL DEFAULT false,
	`created_by` char(36),
	`created_at` datetime(3) NOT NULL,
	`revoked_at` datetime(3),
	CONSTRAINT `lesson_links_id` PRIMARY KEY(`id`),
	CONSTRAINT `lesson_links_token_hash_unique` UNIQUE(`token_hash`)
);
--> statement-breakpoint
CREATE TABLE `lessons` (
	`id` char(36) NOT NULL,
	`workspace_id` char(36) NOT NULL,
	`title` varchar(120) NOT NULL,
	`template` enum('seedbank-decay','one-year-seed-set','annual-vs-perennial','which-stage') NOT NULL,
	`profile_id` char(36),
	`definition` longtext NOT NULL,
	`prompts` longtext NOT NULL,
	`created_by` char(36),
	`created_at` datetime(3) NOT NULL,
	`updated_at` datetime(3) NOT NULL,
	CONSTRAINT `lessons_id` PRIMARY KEY(`id`)
);
--> statement-breakpoint
CREATE TABLE `species_cards` (
	`id` char(36) NOT NULL,
	`workspace_id` char(36) NOT NULL,
	`profile_id` char(36) NOT NULL,
	`identification_notes` text NOT NULL,
	`look_alikes` longtext NOT NULL,
	`life_form` varchar(120) NOT NULL,
	`status` varchar(200) NOT NULL,
	`created_at` datetime(3) NOT NULL,
	`updated_at` datetime(3) NOT NULL,
	CONSTRAINT `species_cards_id` PRIMARY KEY(`id`),
	CONSTRAINT `species_cards_profile` UNIQUE(`workspace_id`,`profile_id`)
);
--> statement-breakpoint
CREATE TABLE `mail_fake_messages` (
	`id` bigint unsigned AUTO_INCREMENT NOT NULL,
	`to_address` text NOT NULL,
	`from_address` varchar(320) NOT NULL,
	`subject` varchar(300) NOT NULL,
	`text` mediumtext NOT NULL,
	`html` mediumtext NOT NULL,
	`received_at` datetime(3) NOT NULL,
	CONSTRAINT `mail_fake_messages_id` PRIMARY KEY(`id`)
);
--> statement-breakpoint
CREATE TABLE `mail_queue` (
	`id` bigint unsigned AUTO_INCREMENT NOT NULL,
	`to_address` varchar(254) NOT NULL,
	`subject` varchar(300) NOT NULL,
	`text` mediumtext NOT NULL,
	`html` mediumtext NOT NULL,
	`status` enum('queued','sent','failed') NOT NULL DEFAULT 'queued',
	`attempts` int NOT NULL DEFAULT 0,
	`next_attempt_at` datetime(3) NOT NULL,
	`last_error` text,
	`created_at` datetime(3) NOT NULL,
	`sent_at` datetime(3),
	CONSTRAINT `mail_queue_id` PRIMARY KEY(`id`)
);
--> statement-breakpoint
CREATE TABLE `notification_settings` (
	`user_id` char(36) NOT NULL,
	`email` boolean NOT NULL,
	`updated_at` datetime(3) NOT NULL,
	CONSTRAINT `notification_settings_user_id` PRIMARY KEY(`user_id`)
);
--> statement-breakpoint
CREATE TABLE `notifications` (
	`id` char(36) NOT NULL,
	`user_id` char(36) NOT NULL,
	`kind` varchar(40) NOT NULL,
	`subject` varchar(80) NOT NULL,
	`title` varchar(200) NOT NULL,
	`body` text NOT NULL,
	`link` varchar(500),
	`created_at` datetime(3) NOT NULL,
	`read_at` datetime(3),
	CONSTRAINT `notifications_id` PRIMARY KEY(`id`),
	CONSTRAINT `notifications_subject` UNIQUE(`user_id`,`subject`)
);
--> statement-breakpoint
CREATE TABLE `password_resets` (
	`id` char(36) NOT NULL,
	`user_id` char(36) NOT NULL,
	`token_hash` char(64) NOT NULL,
	`created_at` datetime(3) NOT NULL,
	`expires_at` datetime(3) NOT NULL,
	`used_at` datetime(3),
	CONSTRAINT `password_resets_id` PRIMARY KEY(`id`),
	CONSTRAINT `password_resets_token_hash_unique` UNIQUE(`token_hash`)
);
--> statement-breakpoint
CREATE TABLE `record_adoptions` (
	`id` char(36) NOT NULL,
	`workspace_id` char(36) NOT NULL,
	`field_id` char(36) NOT NULL,
	`estimate_key` text NOT NULL,
	`estimate_label` varchar(300) NOT NULL,
	`target_kind` enum('profile','step','field-seedbank') NOT NULL,
	`profile_id` char(36),
	`strategy_id` char(36),
	`step_index` int,
	`step_label` varchar(200),
	`target_name` varchar(200) NOT NULL,
	`path` varchar(120) NOT NULL,
	`previous` longtext NOT NULL,
	`value` longtext NOT NULL,
	`note` text NOT NULL,
	`sources` longtext NOT NULL,
	`adopted_by` char(36),
	`adopted_at` datetime(3) NOT NULL,
	CONSTRAINT `record_adoptions_id` PRIMARY KEY(`id`)
);
--> statement-breakpoint
CREATE TABLE `record_rows` (
	`upload_id` char(36) NOT NULL,
	`line` int NOT NULL,
	`data` longtext NOT NULL,
	CONSTRAINT `record_rows_upload_id_line_pk` PRIMARY KEY(`upload_id`,`line`)
);
--> statement-breakpoint
CREATE TABLE `record_uploads` (
	`id` char(36) NOT NULL,
	`workspace_id` char(36) NOT NULL,
	`field_id` char(36) NOT NULL,
	`kind` enum('seedbank-samples','plant-counts','germination-tests','efficacy-trials') NOT NULL,
	`filename` varchar(255) NOT NULL,
	`content_type` varchar(100) NOT NULL,
	`byte_size` int NOT NULL,
	`sha256` char(64) NOT NULL,
	`data` longblob NOT NULL,
	`row_count` int NOT NULL,
	`check_name` varchar(200),
	`meta` longtext NOT NULL,
	`uploaded_by` char(36),
	`uploaded_at` datetime(3) NOT NULL,
	CONSTRAINT `record_uploads_id` PRIMARY KEY(`id`)
);
--> statement-breakpoint
CREATE TABLE `shares` (
	`workspace_id` char(36) NOT NULL,
	`batch_id` char(36) NOT NULL,
	`user_id` char(36) NOT NULL,
	`shared_by` char(36),
	`created_at` datetime(3) NOT NULL,
	CONSTRAINT `shares_batch_id_user_id_pk` PRIMARY KEY(`batch_id`,`user_id`)
);
--> statement-breakpoint
CREATE TABLE `sweep_chunks` (
	`sweep_id` char(36) NOT NULL,
	`chunk_index` int NOT NULL,
	`first_point` int NOT NULL,
	`end_point` int NOT NULL,
	`status` enum('pending','claimed','done') NOT NULL,
	`worker_id` varchar(120),
	`lease_expires_at` datetime(3),
	`heartbeat_at` datetime(3),
	`attempts` int NOT NULL DEFAULT 0,
	`last_error` text,
	`completed_at` datetime(3),
	CONSTRAINT `sweep_chunks_sweep_id_chunk_index_pk` PRIMARY KEY(`sweep_id`,`chunk_index`)
);
--> statement-breakpoint
CREATE TABLE `sweep_claims` (
	`id` bigint unsigned AUTO_INCREMENT NOT NULL,
	`sweep_id` char(36) NOT NULL,
	`chunk_index` int NOT NULL,
	`worker_id` varchar(120) NOT NULL,
	`claimed_at` datetime(3) NOT NULL,
	`previous_worker_id` varchar(120),
	`previous_lease_expires_at` datetime(3),
	`finished_at` datetime(3),
	`outcome` enum('completed','released','lost'),
	CONSTRAINT `sweep_claims_id` PRIMARY KEY(`id`)
);
--> statement-breakpoint
CREATE TABLE `sweep_results` (
	`sweep_id` char(36) NOT NULL,
	`point_index` int NOT NULL,
	`inputs` longtext NOT NULL,
	`outcomes` longtext,
	`error` text,
	`created_at` datetime(3) NOT NULL,
	CONSTRAINT `sweep_results_sweep_id_point_index_pk` PRIMARY KEY(`sweep_id`,`point_index`)
);
--> statement-breakpoint
CREATE TABLE `sweeps` (
	`id` char(36) NOT NULL,
	`workspace_id` char(36) NOT NULL,
	`scenario_id` char(36),
	`strategy_id` char(36),
	`name` varchar(120) NOT NULL,
	`definition` longtext NOT NULL,
	`base` longtext NOT NULL,
	`points` longtext NOT NULL,
	`total_points` int NOT NULL,
	`total_chunks` int NOT NULL,
	`replicate_years` bigint unsigned NOT NULL,
	`points_done` int NOT NULL DEFAULT 0,
	`failed_points` int NOT NULL DEFAULT 0,
	`chunks_done` int NOT NULL DEFAULT 0,
	`status` enum('queued','running','paused','done','failed','cancelled') NOT NULL,
	`error` text,
	`created_by` char(36),
	`created_at` datetime(3) NOT NULL,
	`started_at` datetime(3),
	`finished_at` datetime(3),
	CONSTRAINT `sweeps_id` PRIMARY KEY(`id`)
);
--> statement-breakpoint
ALTER TABLE `invitations` ADD CONSTRAINT `invitations_workspace_id_workspaces_id_fk` FOREIGN KEY (`workspace_id`) REFERENCES `workspaces`(`id`) ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `invitations` ADD CONSTRAINT `invitations_invited_by_users_id_fk` FOREIGN KEY (`invited_by`) REFERENCES `users`(`id`) ON DELETE set null ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `invitations` ADD CONSTRAINT `invitations_accepted_by_users_id_fk` FOREIGN KEY (`accepted_by`) REFERENCES `users`(`id`) ON DELETE set null ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `card_photos` ADD CONSTRAINT `card_photos_card_id_species_cards_id_fk` FOREIGN KEY (`card_id`) REFERENCES `species_cards`(`id`) ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `lesson_links` ADD CONSTRAINT `lesson_links_lesson_id_lessons_id_fk` FOREIGN KEY (`lesson_id`) REFERENCES `lessons`(`id`) ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `lesson_links` ADD CONSTRAINT `lesson_links_created_by_users_id_fk` FOREIGN KEY (`created_by`) REFERENCES `users`(`id`) ON DELETE set null ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `lessons` ADD CONSTRAINT `lessons_workspace_id_workspaces_id_fk` FOREIGN KEY (`workspace_id`) REFERENCES `workspaces`(`id`) ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `lessons` ADD CONSTRAINT `lessons_profile_id_species_profiles_id_fk` FOREIGN KEY (`profile_id`) REFERENCES `species_profiles`(`id`) ON DELETE restrict ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `lessons` ADD CONSTRAINT `lessons_created_by_users_id_fk` FOREIGN KEY (`created_by`) REFERENCES `users`(`id`) ON DELETE set null ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `species_cards` ADD CONSTRAINT `species_cards_workspace_id_workspaces_id_fk` FOREIGN KEY (`workspace_id`) REFERENCES `workspaces`(`id`) ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `species_cards` ADD CONSTRAINT `species_cards_profile_id_species_profiles_id_fk` FOREIGN KEY (`profile_id`) REFERENCES `species_profiles`(`id`) ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `notification_settings` ADD CONSTRAINT `notification_settings_user_id_users_id_fk` FOREIGN KEY (`user_id`) REFERENCES `users`(`id`) ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `notifications` ADD CONSTRAINT `notifications_user_id_users_id_fk` FOREIGN KEY (`user_id`) REFERENCES `users`(`id`) ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `password_resets` ADD CONSTRAINT `password_resets_user_id_users_id_fk` FOREIGN KEY (`user_id`) REFERENCES `users`(`id`) ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `record_adoptions` ADD CONSTRAINT `record_adoptions_workspace_id_workspaces_id_fk` FOREIGN KEY (`workspace_id`) REFERENCES `workspaces`(`id`) ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `record_adoptions` ADD CONSTRAINT `record_adoptions_field_id_fields_id_fk` FOREIGN KEY (`field_id`) REFERENCES `fields`(`id`) ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `record_adoptions` ADD CONSTRAINT `record_adoptions_profile_id_species_profiles_id_fk` FOREIGN KEY (`profile_id`) REFERENCES `species_profiles`(`id`) ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `record_adoptions` ADD CONSTRAINT `record_adoptions_strategy_id_strategies_id_fk` FOREIGN KEY (`strategy_id`) REFERENCES `strategies`(`id`) ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `record_adoptions` ADD CONSTRAINT `record_adoptions_adopted_by_users_id_fk` FOREIGN KEY (`adopted_by`) REFERENCES `users`(`id`) ON DELETE set null ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `record_rows` ADD CONSTRAINT `record_rows_upload_id_record_uploads_id_fk` FOREIGN KEY (`upload_id`) REFERENCES `record_uploads`(`id`) ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `record_uploads` ADD CONSTRAINT `record_uploads_workspace_id_workspaces_id_fk` FOREIGN KEY (`workspace_id`) REFERENCES `workspaces`(`id`) ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `record_uploads` ADD CONSTRAINT `record_uploads_field_id_fields_id_fk` FOREIGN KEY (`field_id`) REFERENCES `fields`(`id`) ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `record_uploads` ADD CONSTRAINT `record_uploads_uploaded_by_users_id_fk` FOREIGN KEY (`uploaded_by`) REFERENCES `users`(`id`) ON DELETE set null ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `shares` ADD CONSTRAINT `shares_workspace_id_workspaces_id_fk` FOREIGN KEY (`workspace_id`) REFERENCES `workspaces`(`id`) ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `shares` ADD CONSTRAINT `shares_user_id_users_id_fk` FOREIGN KEY (`user_id`) REFERENCES `users`(`id`) ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `shares` ADD CONSTRAINT `shares_shared_by_users_id_fk` FOREIGN KEY (`shared_by`) REFERENCES `users`(`id`) ON DELETE set null ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `sweep_chunks` ADD CONSTRAINT `sweep_chunks_sweep_id_sweeps_id_fk` FOREIGN KEY (`sweep_id`) REFERENCES `sweeps`(`id`) ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `sweep_claims` ADD CONSTRAINT `sweep_claims_sweep_id_sweeps_id_fk` FOREIGN KEY (`sweep_id`) REFERENCES `sweeps`(`id`) ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `sweep_results` ADD CONSTRAINT `sweep_results_sweep_id_sweeps_id_fk` FOREIGN KEY (`sweep_id`) REFERENCES `sweeps`(`id`) ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `sweeps` ADD CONSTRAINT `sweeps_workspace_id_workspaces_id_fk` FOREIGN KEY (`workspace_id`) REFERENCES `workspaces`(`id`) ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `sweeps` ADD CONSTRAINT `sweeps_scenario_id_scenarios_id_fk` FOREIGN KEY (`scenario_id`) REFERENCES `scenarios`(`id`) ON DELETE set null ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `sweeps` ADD CONSTRAINT `sweeps_strategy_id_strategies_id_fk` FOREIGN KEY (`strategy_id`) REFERENCES `strategies`(`id`) ON DELETE set null ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `sweeps` ADD CONSTRAINT `sweeps_created_by_users_id_fk` FOREIGN KEY (`created_by`) REFERENCES `users`(`id`) ON DELETE set null ON UPDATE no action;--> statement-breakpoint
CREATE INDEX `invitations_workspace` ON `invitations` (`workspace_id`,`email`);--> statement-breakpoint
CREATE INDEX `card_photos_card` ON `card_photos` (`card_id`,`created_at`);--> statement-breakpoint
CREATE INDEX `lesson_links_lesson` ON `lesson_links` (`lesson_id`,`revoked`);--> statement-breakpoint
CREATE INDEX `lessons_workspace` ON `lessons` (`workspace_id`,`updated_at`);--> statement-breakpoint
CREATE INDEX `mail_fake_received` ON `mail_fake_messages` (`received_at`);--> statement-breakpoint
CREATE INDEX `mail_queue_due` ON `mail_queue` (`status`,`next_attempt_at`);--> statement-breakpoint
CREATE INDEX `notifications_user` ON `notifications` (`user_id`,`created_at`);--> statement-breakpoint
CREATE INDEX `password_resets_user` ON `password_resets` (`user_id`);--> statement-breakpoint
CREATE INDEX `record_adoptions_field` ON `record_adoptions` (`field_id`,`adopted_at`);--> statement-breakpoint
CREATE INDEX `record_adoptions_strategy` ON `record_adoptions` (`strategy_id`);--> statement-breakpoint
CREATE INDEX `record_uploads_field` ON `record_uploads` (`field_id`,`kind`,`uploaded_at`);--> statement-breakpoint
CREATE INDEX `record_uploads_sha` ON `record_uploads` (`field_id`,`sha256`);--> statement-breakpoint
CREATE INDEX `shares_user` ON `shares` (`user_id`,`workspace_id`);--> statement-breakpoint
CREATE INDEX `sweep_chunks_claimable` ON `sweep_chunks` (`status`,`lease_expires_at`);--> statement-breakpoint
CREATE INDEX `sweep_claims_chunk` ON `sweep_claims` (`sweep_id`,`chunk_index`);--> statement-breakpoint
CREATE INDEX `sweep_results_recent` ON `sweep_results` (`sweep_id`,`created_at`);--> statement-breakpoint
CREATE INDEX `sweeps_workspace` ON `sweeps` (`workspace_id`,`created_at`);--> statement-breakpoint
CREATE INDEX `sweeps_status` ON `sweeps` (`status`);