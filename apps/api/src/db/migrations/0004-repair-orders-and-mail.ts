// Repair orders and e-mail: every save of a case's findings as an immutable revision (an approved
// one frozen by a trigger, like published tree versions), the photos chosen for the repair order,
// the outbox every message is written to before a worker sends it, and the single-use tokens
// behind invitations and password resets (stored hashed).
import type { MigrationFn } from 'umzug';
import type { QueryInterface } from 'sequelize';

export const up: MigrationFn<QueryInterface> = async ({ context: qi }) => {
  await qi.sequelize.query(`
    ALTER TABLE findings ADD COLUMN photo_ids jsonb NOT NULL DEFAULT '[]';

    CREATE TABLE findings_revisions (
      id uuid PRIMARY KEY,
      finding_id uuid NOT NULL REFERENCES findings(id),
      case_id uuid NOT NULL REFERENCES cases(id),
      workshop_id uuid NOT NULL REFERENCES workshops(id),
      revision integer NOT NULL CHECK (revision >= 1),
      outcome_node_id varchar(80) NOT NULL,
      concern text NOT NULL,
      cause text NOT NULL,
      correction text NOT NULL,
      parts jsonb NOT NULL,
      labour jsonb NOT NULL,
      follow_ups jsonb NOT NULL,
      readings jsonb NOT NULL,
      photo_ids jsonb NOT NULL DEFAULT '[]',
      saved_by uuid REFERENCES users(id),
      approved_by uuid REFERENCES users(id),
      approved_at timestamptz,
      created_at timestamptz NOT NULL DEFAULT now(),
      UNIQUE (case_id, revision),
      CONSTRAINT findings_revisions_approval_whole CHECK ((approved_by IS NULL) = (approved_at IS NULL))
    );
    CREATE INDEX findings_revisions_approved_idx ON findings_revisions (case_id, revision DESC)
      WHERE approved_at IS NOT NULL;

    -- A revision is history: its content never changes. Its approval is added once; from then on
    -- the row is frozen and cannot be deleted, so an exported repair order can always be re-made.
    CREATE FUNCTION findings_revisions_freeze() RETURNS trigger LANGUAGE plpgsql AS $fn$
    BEGIN
      IF TG_OP = 'DELETE' THEN
        IF OLD.approved_at IS NOT NULL THEN
          RAISE EXCEPTION 'heatpath: approved findings revision % cannot be deleted', OLD.revision;
        END IF;
        RETURN OLD;
      END IF;
      IF OLD.approved_at IS NOT NULL THEN
        RAISE EXCEPTION 'heatpath: approved findings revision % cannot be changed', OLD.revision;
      END IF;
      IF (NEW.id, NEW.finding_id, NEW.case_id, NEW.workshop_id, NEW.revision, NEW.outcome_node_id,
          NEW.concern, NEW.cause, NEW.correction, NEW.parts, NEW.labour, NEW.follow_ups,
          NEW.readings, NEW.photo_ids, NEW.saved_by, NEW.created_at)
        IS DISTINCT FROM
         (OLD.id, OLD.finding_id, OLD.case_id, OLD.workshop_id, OLD.revision, OLD.outcome_node_id,
          OLD.concern, OLD.cause, OLD.correction, OLD.parts, OLD.labour, OLD.follow_ups,
          OLD.readings, OLD.photo_ids, OLD.saved_by, OLD.created_at)
      THEN
        RAISE EXCEPTION 'heatpath: findings revision % cannot be changed; save a new revision', OLD.revision;
      END IF;
      RETURN NEW;
    END
    $fn$;
    CREATE TRIGGER findings_revisions_freeze BEFORE UPDATE OR DELETE ON findings_revisions
      FOR EACH ROW EXECUTE FUNCTION findings_revisions_freeze();

    CREATE TYPE outbox_status AS ENUM ('queued', 'sending', 'sent', 'failed');
    CREATE TABLE outbox_messages (
      id uuid PRIMARY KEY,
      workshop_id uuid NOT NULL REFERENCES workshops(id),
      kind varchar(30) NOT NULL,
      case_id uuid REFERENCES cases(id),
      findings_revision integer,
      recipients jsonb NOT NULL,
      subject varchar(250) NOT NULL,
      body_text text NOT NULL,
      -- A sign-in link, encrypted, for the worker to put into the body; cleared once sent.
      sealed_link text,
      status outbox_status NOT NULL DEFAULT 'queued',
      attempts integer NOT NULL DEFAULT 0,
      next_attempt_at timestamptz NOT NULL DEFAULT now(),
      last_attempt_at timestamptz,
      last_error text,
      sent_at timestamptz,
      smtp_message_id varchar(250),
      created_by uuid REFERENCES users(id),
      created_at timestamptz NOT NULL DEFAULT now(),
      updated_at timestamptz NOT NULL DEFAULT now(),
      CONSTRAINT outbox_messages_has_recipient CHECK (jsonb_array_length(recipients) >= 1)
    );
    -- The worker's claim: due messages, oldest first. A claimed message is 'sending' with its
    -- next attempt set to the end of the claim, so one whose worker died becomes due again.
    CREATE INDEX outbox_messages_due_idx ON outbox_messages (next_attempt_at)
      WHERE status IN ('queued', 'sending');
    CREATE INDEX outbox_messages_page_idx ON outbox_messages (workshop_id, created_at DESC, id DESC);
    CREATE INDEX outbox_messages_case_idx ON outbox_messages (case_id, created_at DESC)
      WHERE case_id IS NOT NULL;

    CREATE TABLE outbox_attachments (
      id uuid PRIMARY KEY,
      message_id uuid NOT NULL REFERENCES outbox_messages(id),
      workshop_id uuid NOT NULL REFERENCES workshops(id),
      filename varchar(200) NOT NULL,
      media_type varchar(100) NOT NULL,
      byte_size integer NOT NULL,
      content bytea NOT NULL,
      created_at timestamptz NOT NULL DEFAULT now()
    );
    CREATE INDEX outbox_attachments_message_idx ON outbox_attachments (message_id);

    CREATE TYPE account_token_purpose AS ENUM ('invitation', 'password-reset');
    CREATE TABLE account_tokens (
      id uuid PRIMARY KEY,
      user_id uuid NOT NULL REFERENCES users(id),
      workshop_id uuid NOT NULL REFERENCES workshops(id),
      purpose account_token_purpose NOT NULL,
      -- SHA-256 of the token; the token itself is only ever in the e-mail.
      token_hash char(64) NOT NULL UNIQUE,
      expires_at timestamptz NOT NULL,
      used_at timestamptz,
      created_by uuid REFERENCES users(id),
      created_at timestamptz NOT NULL DEFAULT now()
    );
    CREATE INDEX account_tokens_open_idx ON account_tokens (user_id, purpose) WHERE used_at IS NULL;
  `);
};

export const down: MigrationFn<QueryInterface> = async ({ context: qi }) => {
  await qi.sequelize.query(`
    DROP TABLE account_tokens;
    DROP TYPE account_token_purpose;
    DROP TABLE outbox_attachments;
    DROP TABLE outbox_messages;
    DROP TYPE outbox_status;
    DROP TRIGGER findings_revisions_freeze ON findings_revisions;
    DROP FUNCTION findings_revisions_freeze();
    DROP TABLE findings_revisions;
    ALTER TABLE findings DROP COLUMN photo_ids;
  `);
};
