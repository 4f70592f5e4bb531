// Sessions that end: a row per signed-in browser, checked on every request, so signing out, a
// new password or a deactivation ends a session in every API process at once. Also the
// browsers a person has signed in from (the device-cookie pattern), the sign-in allowances
// counted per account, browser and address, and the e-mailed unlock link's token purpose.
import type { MigrationFn } from 'umzug';
import type { QueryInterface } from 'sequelize';

export const up: MigrationFn<QueryInterface> = async ({ context: qi }) => {
  await qi.sequelize.query(`
    CREATE TABLE sessions (
      id uuid PRIMARY KEY,
      user_id uuid NOT NULL REFERENCES users(id),
      workshop_id uuid NOT NULL REFERENCES workshops(id),
      created_at timestamptz NOT NULL,
      expires_at timestamptz NOT NULL,
      ended_at timestamptz,
      ended_reason varchar(30),
      CONSTRAINT sessions_end_whole CHECK ((ended_at IS NULL) = (ended_reason IS NULL))
    );
    CREATE INDEX sessions_open_idx ON sessions (user_id) WHERE ended_at IS NULL;
    CREATE INDEX sessions_expiry_idx ON sessions (user_id, expires_at);

    -- A browser that has signed in as a person. The browser carries only a signed random id;
    -- which people it has signed in as is kept here, so a shared workshop PC is known for each.
    CREATE TABLE sign_in_devices (
      device_id uuid NOT NULL,
      user_id uuid NOT NULL REFERENCES users(id),
      workshop_id uuid NOT NULL REFERENCES workshops(id),
      created_at timestamptz NOT NULL,
      last_sign_in_at timestamptz NOT NULL,
      PRIMARY KEY (device_id, user_id)
    );
    CREATE INDEX sign_in_devices_user_idx ON sign_in_devices (user_id);

    -- Sign-in attempts per key (an account from unknown browsers, one known browser, an
    -- address): attempts in flight and failures take a slot; a success gives its slot back.
    CREATE TABLE sign_in_allowances (
      key varchar(300) PRIMARY KEY,
      attempts integer NOT NULL,
      window_started_at timestamptz NOT NULL,
      locked_until timestamptz
    );

    -- Whatever code changes a person, a deactivation or a new password ends their sessions, and
    -- a new password also forgets the browsers they signed in from (an attacker's among them).
    CREATE FUNCTION users_end_sessions() RETURNS trigger LANGUAGE plpgsql AS $fn$
    BEGIN
      IF OLD.active AND NOT NEW.active THEN
        UPDATE sessions SET ended_at = now(), ended_reason = 'deactivated'
          WHERE user_id = NEW.id AND ended_at IS NULL;
      END IF;
      IF OLD.password_hash IS DISTINCT FROM NEW.password_hash THEN
        UPDATE sessions SET ended_at = now(), ended_reason = 'password-changed'
          WHERE user_id = NEW.id AND ended_at IS NULL;
        DELETE FROM sign_in_devices WHERE user_id = NEW.id;
      END IF;
      RETURN NEW;
    END
    $fn$;
    CREATE TRIGGER users_end_sessions AFTER UPDATE OF active, password_hash ON users
      FOR EACH ROW EXECUTE FUNCTION users_end_sessions();

    ALTER TYPE account_token_purpose ADD VALUE 'sign-in-unlock';
  `);
};

export const down: MigrationFn<QueryInterface> = async ({ context: qi }) => {
  await qi.sequelize.query(`
    DELETE FROM account_tokens WHERE purpose = 'sign-in-unlock';
    ALTER TYPE account_token_purpose RENAME TO account_token_purpose_old;
    CREATE TYPE account_token_purpose AS ENUM ('invitation', 'password-reset');
    ALTER TABLE account_tokens ALTER COLUMN purpose TYPE account_token_purpose
      USING purpose::text::account_token_purpose;
    DROP TYPE account_token_purpose_old;
    DROP TRIGGER users_end_sessions ON users;
    DROP FUNCTION users_end_sessions();
    DROP TABLE sign_in_allowances;
    DROP TABLE sign_in_devices;
    DROP TABLE sessions;
  `);
};
