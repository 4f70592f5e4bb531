// Customers, vehicles, decision trees with immutable published versions, cases with their
// event history (the walk is rebuilt from it), attachments and findings.
import type { MigrationFn } from 'umzug';
import type { QueryInterface } from 'sequelize';

export const up: MigrationFn<QueryInterface> = async ({ context: qi }) => {
  await qi.sequelize.query(`
    CREATE EXTENSION IF NOT EXISTS pg_trgm;
    ALTER TABLE workshops ADD COLUMN case_counter integer NOT NULL DEFAULT 0;

    CREATE TABLE customers (
      id uuid PRIMARY KEY,
      workshop_id uuid NOT NULL REFERENCES workshops(id),
      name varchar(120) NOT NULL,
      phone varchar(40),
      email varchar(254),
      created_at timestamptz NOT NULL DEFAULT now(),
      updated_at timestamptz NOT NULL DEFAULT now()
    );
    CREATE INDEX customers_workshop_name_idx ON customers (workshop_id, lower(name));

    CREATE TYPE fuel_kind AS ENUM ('petrol', 'diesel', 'hybrid', 'plug-in-hybrid', 'lpg', 'other');
    CREATE TYPE distance_unit AS ENUM ('km', 'mi');
    CREATE TABLE vehicles (
      id uuid PRIMARY KEY,
      workshop_id uuid NOT NULL REFERENCES workshops(id),
      customer_id uuid REFERENCES customers(id),
      vin char(17),
      plate varchar(16),
      plate_key varchar(16),
      make varchar(60) NOT NULL,
      model varchar(60) NOT NULL,
      year smallint CHECK (year BETWEEN 1950 AND 2100),
      engine varchar(80),
      fuel fuel_kind,
      mileage integer CHECK (mileage >= 0),
      mileage_unit distance_unit NOT NULL DEFAULT 'km',
      created_at timestamptz NOT NULL DEFAULT now(),
      updated_at timestamptz NOT NULL DEFAULT now(),
      CONSTRAINT vehicles_identified CHECK (vin IS NOT NULL OR plate_key IS NOT NULL)
    );
    CREATE UNIQUE INDEX vehicles_workshop_vin_key ON vehicles (workshop_id, vin) WHERE vin IS NOT NULL;
    CREATE UNIQUE INDEX vehicles_workshop_plate_key ON vehicles (workshop_id, plate_key) WHERE plate_key IS NOT NULL;

    CREATE TABLE trees (
      id uuid PRIMARY KEY,
      workshop_id uuid NOT NULL REFERENCES workshops(id),
      key varchar(80) NOT NULL,
      title varchar(200) NOT NULL,
      symptom varchar(300) NOT NULL,
      created_at timestamptz NOT NULL DEFAULT now(),
      updated_at timestamptz NOT NULL DEFAULT now(),
      UNIQUE (workshop_id, key)
    );
    CREATE TYPE tree_version_status AS ENUM ('draft', 'published', 'retired');
    CREATE TABLE tree_versions (
      id uuid PRIMARY KEY,
      tree_id uuid NOT NULL REFERENCES trees(id),
      workshop_id uuid NOT NULL REFERENCES workshops(id),
      version integer NOT NULL CHECK (version >= 1),
      status tree_version_status NOT NULL DEFAULT 'draft',
      definition jsonb NOT NULL,
      change_note text,
      revision integer NOT NULL DEFAULT 1,
      created_by uuid REFERENCES users(id),
      published_by uuid REFERENCES users(id),
      published_at timestamptz,
      retired_at timestamptz,
      created_at timestamptz NOT NULL DEFAULT now(),
      updated_at timestamptz NOT NULL DEFAULT now(),
      UNIQUE (tree_id, version),
      CONSTRAINT tree_versions_published_has_publisher CHECK (status = 'draft' OR published_at IS NOT NULL)
    );
    CREATE UNIQUE INDEX tree_versions_one_draft ON tree_versions (tree_id) WHERE status = 'draft';
    CREATE INDEX tree_versions_workshop_idx ON tree_versions (workshop_id, tree_id, version DESC);

    -- A published version is frozen in the database itself: only its retirement may change.
    CREATE FUNCTION tree_versions_freeze() RETURNS trigger LANGUAGE plpgsql AS $fn$
    BEGIN
      IF TG_OP = 'DELETE' THEN
        IF OLD.status <> 'draft' THEN
          RAISE EXCEPTION 'heatpath: published tree version % cannot be deleted', OLD.version;
        END IF;
        RETURN OLD;
      END IF;
      IF OLD.status <> 'draft' THEN
        IF NEW.definition IS DISTINCT FROM OLD.definition
          OR NEW.version IS DISTINCT FROM OLD.version
          OR NEW.tree_id IS DISTINCT FROM OLD.tree_id
          OR NEW.workshop_id IS DISTINCT FROM OLD.workshop_id
          OR NEW.change_note IS DISTINCT FROM OLD.change_note
          OR NEW.published_by IS DISTINCT FROM OLD.published_by
          OR NEW.published_at IS DISTINCT FROM OLD.published_at
          OR NOT (NEW.status = OLD.status OR (OLD.status = 'published' AND NEW.status = 'retired'))
        THEN
          RAISE EXCEPTION 'heatpath: published tree version % cannot be changed', OLD.version;
        END IF;
      END IF;
      RETURN NEW;
    END
    $fn$;
    CREATE TRIGGER tree_versions_freeze BEFORE UPDATE OR DELETE ON tree_versions
      FOR EACH ROW EXECUTE FUNCTION tree_versions_freeze();

    CREATE TYPE case_status AS ENUM ('open', 'in_diagnosis', 'diagnosed', 'closed');
    CREATE TABLE cases (
      id uuid PRIMARY KEY,
      workshop_id uuid NOT NULL REFERENCES workshops(id),
      number integer NOT NULL,
      vehicle_id uuid NOT NULL REFERENCES vehicles(id),
      customer_id uuid REFERENCES customers(id),
      complaint text NOT NULL,
      mileage_at_intake integer CHECK (mileage_at_intake >= 0),
      mileage_unit distance_unit NOT NULL DEFAULT 'km',
      symptom varchar(300) NOT NULL,
      tree_version_id uuid NOT NULL REFERENCES tree_versions(id),
      status case_status NOT NULL DEFAULT 'open',
      assigned_to uuid REFERENCES users(id),
      created_by uuid NOT NULL REFERENCES users(id),
      current_node_id varchar(80),
      current_step_title varchar(200),
      outcome_node_id varchar(80),
      event_count integer NOT NULL DEFAULT 0,
      search_text text NOT NULL DEFAULT '',
      diagnosed_at timestamptz,
      closed_at timestamptz,
      created_at timestamptz NOT NULL DEFAULT now(),
      updated_at timestamptz NOT NULL DEFAULT now(),
      UNIQUE (workshop_id, number)
    );
    -- Keyset pagination: newest first, ties broken by id, within a workshop and its filters.
    CREATE INDEX cases_page_idx ON cases (workshop_id, created_at DESC, id DESC);
    CREATE INDEX cases_status_page_idx ON cases (workshop_id, status, created_at DESC, id DESC);
    CREATE INDEX cases_assignee_page_idx ON cases (workshop_id, assigned_to, created_at DESC, id DESC);
    CREATE INDEX cases_search_idx ON cases USING gin (search_text gin_trgm_ops);
    CREATE INDEX cases_vehicle_idx ON cases (vehicle_id);

    CREATE TABLE case_events (
      id uuid PRIMARY KEY,
      case_id uuid NOT NULL REFERENCES cases(id),
      workshop_id uuid NOT NULL REFERENCES workshops(id),
      seq integer NOT NULL,
      kind varchar(30) NOT NULL,
      node_id varchar(80),
      payload jsonb NOT NULL DEFAULT '{}',
      idempotency_key varchar(100),
      actor_id uuid NOT NULL REFERENCES users(id),
      created_at timestamptz NOT NULL DEFAULT now(),
      UNIQUE (case_id, seq)
    );
    CREATE UNIQUE INDEX case_events_idempotency_key ON case_events (case_id, idempotency_key)
      WHERE idempotency_key IS NOT NULL;

    CREATE TYPE attachment_kind AS ENUM ('photo', 'file', 'log');
    CREATE TABLE attachments (
      id uuid PRIMARY KEY,
      case_id uuid NOT NULL REFERENCES cases(id),
      workshop_id uuid NOT NULL REFERENCES workshops(id),
      node_id varchar(80),
      kind attachment_kind NOT NULL,
      storage_key varchar(200) NOT NULL,
      thumbnail_key varchar(200),
      original_name varchar(255) NOT NULL,
      media_type varchar(100) NOT NULL,
      byte_size integer NOT NULL,
      width integer,
      height integer,
      uploaded_by uuid NOT NULL REFERENCES users(id),
      created_at timestamptz NOT NULL DEFAULT now(),
      updated_at timestamptz NOT NULL DEFAULT now()
    );
    CREATE INDEX attachments_case_idx ON attachments (case_id, created_at);

    CREATE TABLE findings (
      id uuid PRIMARY KEY,
      case_id uuid NOT NULL UNIQUE REFERENCES cases(id),
      workshop_id uuid NOT NULL REFERENCES workshops(id),
      outcome_node_id varchar(80) NOT NULL,
      concern text NOT NULL,
      cause text NOT NULL,
      correction text NOT NULL,
      parts jsonb NOT NULL DEFAULT '[]',
      labour jsonb NOT NULL DEFAULT '[]',
      follow_ups jsonb NOT NULL DEFAULT '[]',
      readings jsonb NOT NULL DEFAULT '[]',
      revision integer NOT NULL DEFAULT 1,
      updated_by uuid REFERENCES users(id),
      created_at timestamptz NOT NULL DEFAULT now(),
      updated_at timestamptz NOT NULL DEFAULT now()
    );
  `);
};

export const down: MigrationFn<QueryInterface> = async ({ context: qi }) => {
  await qi.sequelize.query(`
    DROP TABLE findings;
    DROP TABLE attachments;
    DROP TYPE attachment_kind;
    DROP TABLE case_events;
    DROP TABLE cases;
    DROP TYPE case_status;
    DROP TRIGGER tree_versions_freeze ON tree_versions;
    DROP FUNCTION tree_versions_freeze();
    DROP TABLE tree_versions;
    DROP TYPE tree_version_status;
    DROP TABLE trees;
    DROP TABLE vehicles;
    DROP TYPE distance_unit;
    DROP TYPE fuel_kind;
    DROP TABLE customers;
    ALTER TABLE workshops DROP COLUMN case_counter;
  `);
};
