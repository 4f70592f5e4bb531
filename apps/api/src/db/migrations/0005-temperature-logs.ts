// Temperature logs on cases: the parsed series (one binary column per channel, float64 in
// little-endian order, NaN for an empty cell) and its analysis beside the original file, which
// is an ordinary attachment; uploads waiting for a person to map their columns; and the column
// mapping a workshop confirmed for each source (scan tool or logger export layout).
import type { MigrationFn } from 'umzug';
import type { QueryInterface } from 'sequelize';

export const up: MigrationFn<QueryInterface> = async ({ context: qi }) => {
  await qi.sequelize.query(`
    CREATE TABLE temperature_log_mappings (
      id uuid PRIMARY KEY,
      workshop_id uuid NOT NULL REFERENCES workshops(id),
      source_signature varchar(40) NOT NULL,
      mapping jsonb NOT NULL,
      confirmed_by uuid NOT NULL REFERENCES users(id),
      created_at timestamptz NOT NULL DEFAULT now(),
      updated_at timestamptz NOT NULL DEFAULT now(),
      UNIQUE (workshop_id, source_signature)
    );

    -- The original file is kept in storage until the mapping comes back (or the upload expires).
    CREATE TABLE temperature_log_uploads (
      id uuid PRIMARY KEY,
      workshop_id uuid NOT NULL REFERENCES workshops(id),
      case_id uuid NOT NULL REFERENCES cases(id),
      node_id varchar(80),
      storage_key varchar(200) NOT NULL UNIQUE,
      original_name varchar(255) NOT NULL,
      byte_size integer NOT NULL CHECK (byte_size > 0),
      source_signature varchar(40) NOT NULL,
      uploaded_by uuid NOT NULL REFERENCES users(id),
      created_at timestamptz NOT NULL DEFAULT now(),
      updated_at timestamptz NOT NULL DEFAULT now()
    );
    CREATE INDEX temperature_log_uploads_case_idx ON temperature_log_uploads (case_id, created_at);
    CREATE INDEX temperature_log_uploads_age_idx ON temperature_log_uploads (workshop_id, created_at);

    CREATE TABLE temperature_logs (
      id uuid PRIMARY KEY,
      workshop_id uuid NOT NULL REFERENCES workshops(id),
      case_id uuid NOT NULL REFERENCES cases(id),
      node_id varchar(80),
      attachment_id uuid NOT NULL UNIQUE REFERENCES attachments(id),
      source_signature varchar(40) NOT NULL,
      mapping jsonb NOT NULL,
      mapping_source varchar(20) NOT NULL
        CHECK (mapping_source IN ('detected', 'confirmed', 'remembered')),
      columns jsonb,
      detected jsonb NOT NULL,
      readings integer NOT NULL CHECK (readings >= 2),
      skipped_rows integer NOT NULL DEFAULT 0,
      duration_seconds double precision NOT NULL CHECK (duration_seconds > 0),
      started_at_text varchar(64),
      times bytea NOT NULL,
      coolant_c bytea NOT NULL,
      intake_air_c bytea,
      ambient_c bytea,
      vehicle_speed_kph bytea,
      engine_speed_rpm bytea,
      fan_duty bytea,
      analysis jsonb NOT NULL,
      uploaded_by uuid NOT NULL REFERENCES users(id),
      created_at timestamptz NOT NULL DEFAULT now(),
      updated_at timestamptz NOT NULL DEFAULT now(),
      CONSTRAINT temperature_logs_columns_match CHECK (octet_length(times) = octet_length(coolant_c))
    );
    CREATE INDEX temperature_logs_case_idx ON temperature_logs (case_id, created_at);
  `);
};

export const down: MigrationFn<QueryInterface> = async ({ context: qi }) => {
  await qi.sequelize.query(`
    DROP TABLE temperature_logs;
    DROP TABLE temperature_log_uploads;
    DROP TABLE temperature_log_mappings;
  `);
};
