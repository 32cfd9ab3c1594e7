import { MigrationInterface, QueryRunner } from 'typeorm';

/** Builds, parts and their features, assemblies and interfaces, measurements, fit checks and their history. */
export class FitData1764700000000 implements MigrationInterface {
  name = 'FitData1764700000000';

  async up(queryRunner: QueryRunner): Promise<void> {
    const timestamps = `
      created_at DATETIME(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(3),
      updated_at DATETIME(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(3) ON UPDATE CURRENT_TIMESTAMP(3)`;
    const table = 'ENGINE=InnoDB DEFAULT CHARSET=utf8mb4 COLLATE=utf8mb4_unicode_ci';

    await queryRunner.query(`CREATE TABLE builds (
      id CHAR(36) NOT NULL PRIMARY KEY,
      workshop_id CHAR(36) NOT NULL,
      title VARCHAR(200) NOT NULL,
      vehicle VARCHAR(200) NOT NULL DEFAULT '',
      goal TEXT NOT NULL,
      status ENUM('planning','in_progress','verified','archived') NOT NULL DEFAULT 'planning',
      created_by CHAR(36) NULL,
      ${timestamps},
      KEY idx_builds_workshop (workshop_id, created_at),
      CONSTRAINT fk_builds_workshop FOREIGN KEY (workshop_id) REFERENCES workshops (id) ON DELETE CASCADE,
      CONSTRAINT fk_builds_creator FOREIGN KEY (created_by) REFERENCES users (id) ON DELETE SET NULL
    ) ${table}`);

    await queryRunner.query(`CREATE TABLE parts (
      id CHAR(36) NOT NULL PRIMARY KEY,
      workshop_id CHAR(36) NOT NULL,
      part_number VARCHAR(80) NOT NULL,
      part_number_key VARCHAR(80) NOT NULL,
      maker VARCHAR(120) NOT NULL DEFAULT '',
      title VARCHAR(200) NOT NULL,
      category ENUM('coupler','shaft','joint','bearing','bore','plate','boot','seal','fastener','other') NOT NULL,
      source ENUM('new','remanufactured','used','original_equipment') NOT NULL DEFAULT 'new',
      notes TEXT NOT NULL,
      photo_keys JSON NOT NULL,
      ${timestamps},
      UNIQUE KEY uq_parts_number (workshop_id, part_number_key),
      KEY idx_parts_category (workshop_id, category),
      CONSTRAINT fk_parts_workshop FOREIGN KEY (workshop_id) REFERENCES workshops (id) ON DELETE CASCADE
    ) ${table}`);

    await queryRunner.query(`CREATE TABLE part_features (
      id CHAR(36) NOT NULL PRIMARY KEY,
      part_id CHAR(36) NOT NULL,
      name VARCHAR(120) NOT NULL,
      kind ENUM('spline','diameter','length','free') NOT NULL,
      spec JSON NOT NULL,
      display_unit VARCHAR(8) NOT NULL DEFAULT 'mm',
      ${timestamps},
      UNIQUE KEY uq_part_features_name (part_id, name),
      CONSTRAINT fk_part_features_part FOREIGN KEY (part_id) REFERENCES parts (id) ON DELETE CASCADE
    ) ${table}`);

    await queryRunner.query(`CREATE TABLE assemblies (
      id CHAR(36) NOT NULL PRIMARY KEY,
      workshop_id CHAR(36) NOT NULL,
      build_id CHAR(36) NOT NULL,
      name VARCHAR(200) NOT NULL,
      notes TEXT NOT NULL,
      ${timestamps},
      KEY idx_assemblies_build (workshop_id, build_id),
      CONSTRAINT fk_assemblies_workshop FOREIGN KEY (workshop_id) REFERENCES workshops (id) ON DELETE CASCADE,
      CONSTRAINT fk_assemblies_build FOREIGN KEY (build_id) REFERENCES builds (id) ON DELETE CASCADE
    ) ${table}`);

    await queryRunner.query(`CREATE TABLE assembly_parts (
      assembly_id CHAR(36) NOT NULL,
      part_id CHAR(36) NOT NULL,
      position VARCHAR(80) NOT NULL,
      sort_order INT NOT NULL DEFAULT 0,
      PRIMARY KEY (assembly_id, part_id),
      CONSTRAINT fk_assembly_parts_assembly FOREIGN KEY (assembly_id) REFERENCES assemblies (id) ON DELETE CASCADE,
      CONSTRAINT fk_assembly_parts_part FOREIGN KEY (part_id) REFERENCES parts (id) ON DELETE RESTRICT
    ) ${table}`);

    await queryRunner.query(`CREATE TABLE assembly_interfaces (
      id CHAR(36) NOT NULL PRIMARY KEY,
      assembly_id CHAR(36) NOT NULL,
      kind ENUM('spline','bore_shaft','length_window') NOT NULL,
      name VARCHAR(160) NOT NULL,
      feature_a_id CHAR(36) NOT NULL,
      feature_b_id CHAR(36) NULL,
      installed_min_nm BIGINT NULL,
      installed_max_nm BIGINT NULL,
      margin_nm BIGINT NULL,
      ${timestamps},
      KEY idx_interfaces_assembly (assembly_id),
      CONSTRAINT fk_interfaces_assembly FOREIGN KEY (assembly_id) REFERENCES assemblies (id) ON DELETE CASCADE,
      CONSTRAINT fk_interfaces_feature_a FOREIGN KEY (feature_a_id) REFERENCES part_features (id) ON DELETE RESTRICT,
      CONSTRAINT fk_interfaces_feature_b FOREIGN KEY (feature_b_id) REFERENCES part_features (id) ON DELETE RESTRICT
    ) ${table}`);

    await queryRunner.query(`CREATE TABLE measurements (
      id CHAR(36) NOT NULL PRIMARY KEY,
      workshop_id CHAR(36) NOT NULL,
      feature_id CHAR(36) NULL,
      interface_id CHAR(36) NULL,
      quantity ENUM('diameter','length','clearance','runout','other') NOT NULL,
      value_text VARCHAR(40) NOT NULL,
      unit VARCHAR(8) NOT NULL,
      value_nm BIGINT NOT NULL,
      instrument_kind ENUM('outside_micrometer','inside_micrometer','bore_gauge','caliper','dial_indicator','feeler_gauge','tape','other') NOT NULL,
      instrument_resolution_nm BIGINT NOT NULL,
      instrument_calibrated_on DATE NULL,
      instrument_note VARCHAR(200) NOT NULL DEFAULT '',
      temperature_c DECIMAL(5,1) NULL,
      taken_by CHAR(36) NULL,
      taken_at DATETIME(3) NOT NULL,
      footage_id CHAR(36) NULL,
      footage_time_ms INT UNSIGNED NULL,
      note VARCHAR(500) NOT NULL DEFAULT '',
      created_at DATETIME(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(3),
      KEY idx_measurements_feature (workshop_id, feature_id),
      KEY idx_measurements_interface (workshop_id, interface_id),
      CONSTRAINT chk_measurements_subject CHECK ((feature_id IS NULL) <> (interface_id IS NULL)),
      CONSTRAINT fk_measurements_workshop FOREIGN KEY (workshop_id) REFERENCES workshops (id) ON DELETE CASCADE,
      CONSTRAINT fk_measurements_feature FOREIGN KEY (feature_id) REFERENCES part_features (id) ON DELETE CASCADE,
      CONSTRAINT fk_measurements_interface FOREIGN KEY (interface_id) REFERENCES assembly_interfaces (id) ON DELETE CASCADE,
      CONSTRAINT fk_measurements_taker FOREIGN KEY (taken_by) REFERENCES users (id) ON DELETE SET NULL
    ) ${table}`);

    await queryRunner.query(`CREATE TABLE fit_checks (
      id CHAR(36) NOT NULL PRIMARY KEY,
      workshop_id CHAR(36) NOT NULL,
      assembly_id CHAR(36) NOT NULL,
      interface_id CHAR(36) NULL,
      kind ENUM('spline_match','fit','length_window','manual') NOT NULL,
      title VARCHAR(200) NOT NULL,
      required TINYINT(1) NOT NULL DEFAULT 1,
      state ENUM('open','bench_pass','confirmed','no_fit','retired') NOT NULL DEFAULT 'open',
      outcome ENUM('pass','fail','unknown') NULL,
      detail JSON NULL,
      reason VARCHAR(500) NOT NULL DEFAULT '',
      confirmed_by CHAR(36) NULL,
      confirmed_at DATETIME(3) NULL,
      ${timestamps},
      KEY idx_fit_checks_assembly (assembly_id),
      UNIQUE KEY uq_fit_checks_interface (interface_id),
      CONSTRAINT fk_fit_checks_workshop FOREIGN KEY (workshop_id) REFERENCES workshops (id) ON DELETE CASCADE,
      CONSTRAINT fk_fit_checks_assembly FOREIGN KEY (assembly_id) REFERENCES assemblies (id) ON DELETE CASCADE,
      CONSTRAINT fk_fit_checks_interface FOREIGN KEY (interface_id) REFERENCES assembly_interfaces (id) ON DELETE CASCADE,
      CONSTRAINT fk_fit_checks_confirmer FOREIGN KEY (confirmed_by) REFERENCES users (id) ON DELETE SET NULL
    ) ${table}`);

    await queryRunner.query(`CREATE TABLE fit_check_evidence (
      id CHAR(36) NOT NULL PRIMARY KEY,
      fit_check_id CHAR(36) NOT NULL,
      kind ENUM('measurement','mark','photo') NOT NULL,
      measurement_id CHAR(36) NULL,
      mark_id CHAR(36) NULL,
      photo_key VARCHAR(300) NULL,
      note VARCHAR(500) NOT NULL DEFAULT '',
      added_by CHAR(36) NULL,
      created_at DATETIME(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(3),
      KEY idx_evidence_check (fit_check_id),
      CONSTRAINT fk_evidence_check FOREIGN KEY (fit_check_id) REFERENCES fit_checks (id) ON DELETE CASCADE,
      CONSTRAINT fk_evidence_measurement FOREIGN KEY (measurement_id) REFERENCES measurements (id) ON DELETE CASCADE,
      CONSTRAINT fk_evidence_adder FOREIGN KEY (added_by) REFERENCES users (id) ON DELETE SET NULL
    ) ${table}`);

    await queryRunner.query(`CREATE TABLE fit_check_events (
      id CHAR(36) NOT NULL PRIMARY KEY,
      fit_check_id CHAR(36) NOT NULL,
      from_state VARCHAR(16) NULL,
      to_state VARCHAR(16) NOT NULL,
      reason VARCHAR(500) NOT NULL,
      actor_id CHAR(36) NULL,
      created_at DATETIME(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(3),
      KEY idx_events_check (fit_check_id, created_at),
      CONSTRAINT fk_events_check FOREIGN KEY (fit_check_id) REFERENCES fit_checks (id) ON DELETE CASCADE,
      CONSTRAINT fk_events_actor FOREIGN KEY (actor_id) REFERENCES users (id) ON DELETE SET NULL
    ) ${table}`);
  }

  async down(queryRunner: QueryRunner): Promise<void> {
    for (const name of [
      'fit_check_events',
      'fit_check_evidence',
      'fit_checks',
      'measurements',
      'assembly_interfaces',
      'assembly_parts',
      'assemblies',
      'part_features',
      'parts',
      'builds',
    ]) {
      await queryRunner.query(`DROP TABLE ${name}`);
    }
  }
}
