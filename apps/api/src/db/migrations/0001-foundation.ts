// Workshops, their people, and the shared sign-in rate-limit counters.
import type { MigrationFn } from 'umzug';
import type { QueryInterface } from 'sequelize';

export const up: MigrationFn<QueryInterface> = async ({ context: qi }) => {
  await qi.sequelize.query(`
    CREATE TABLE workshops (
      id uuid PRIMARY KEY,
      name varchar(120) NOT NULL,
      created_at timestamptz NOT NULL DEFAULT now(),
      updated_at timestamptz NOT NULL DEFAULT now()
    );
    CREATE TYPE user_role AS ENUM ('lead', 'technician', 'apprentice', 'advisor');
    CREATE TABLE users (
      id uuid PRIMARY KEY,
      workshop_id uuid NOT NULL REFERENCES workshops(id) ON DELETE RESTRICT,
      email varchar(254) NOT NULL,
      name varchar(120) NOT NULL,
      role user_role NOT NULL,
      password_hash varchar(100),
      active boolean NOT NULL DEFAULT true,
      preferences jsonb NOT NULL DEFAULT '{"units":{"temperature":"C","pressure":"bar","volume":"L"}}',
      last_sign_in_at timestamptz,
      created_at timestamptz NOT NULL DEFAULT now(),
      updated_at timestamptz NOT NULL DEFAULT now(),
      CONSTRAINT users_email_lower CHECK (email = lower(email))
    );
    CREATE UNIQUE INDEX users_email_key ON users (email);
    CREATE INDEX users_workshop_idx ON users (workshop_id, created_at);
    -- Counters shared by every API process, so a limit holds behind a load balancer.
    CREATE TABLE rate_limit_hits (
      key varchar(300) PRIMARY KEY,
      hits integer NOT NULL,
      reset_at timestamptz NOT NULL
    );
    CREATE INDEX rate_limit_hits_reset_idx ON rate_limit_hits (reset_at);
  `);
};

export const down: MigrationFn<QueryInterface> = async ({ context: qi }) => {
  await qi.sequelize.query(`
    DROP TABLE rate_limit_hits;
    DROP TABLE users;
    DROP TYPE user_role;
    DROP TABLE workshops;
  `);
};
