// Tree authoring: the cases a lead keeps as a tree's regression set, and the record of a publish
// that went ahead although regression cases would reach a different outcome.
import type { MigrationFn } from 'umzug';
import type { QueryInterface } from 'sequelize';

export const up: MigrationFn<QueryInterface> = async ({ context: qi }) => {
  await qi.sequelize.query(`
    CREATE TABLE tree_regression_cases (
      tree_id uuid NOT NULL REFERENCES trees(id),
      case_id uuid NOT NULL REFERENCES cases(id),
      workshop_id uuid NOT NULL REFERENCES workshops(id),
      added_by uuid NOT NULL REFERENCES users(id),
      created_at timestamptz NOT NULL DEFAULT now(),
      PRIMARY KEY (tree_id, case_id)
    );
    ALTER TABLE tree_versions ADD COLUMN publish_confirmation jsonb;
    ALTER TABLE tree_versions ADD COLUMN based_on_version integer;
    CREATE INDEX cases_tree_version_idx ON cases (tree_version_id, status);

    -- The confirmation is written with the publish itself; afterwards it is as frozen as the rest.
    CREATE OR REPLACE FUNCTION tree_versions_freeze() RETURNS trigger LANGUAGE plpgsql AS $fn$
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
          OR NEW.publish_confirmation IS DISTINCT FROM OLD.publish_confirmation
          OR NEW.based_on_version IS DISTINCT FROM OLD.based_on_version
          OR NOT (NEW.status = OLD.status OR (OLD.status = 'published' AND NEW.status = 'retired'))
        THEN
          RAISE EXCEPTION 'heatpath: published tree version % cannot be changed', OLD.version;
        END IF;
      END IF;
      RETURN NEW;
    END
    $fn$;
  `);
};

export const down: MigrationFn<QueryInterface> = async ({ context: qi }) => {
  await qi.sequelize.query(`
    DROP INDEX cases_tree_version_idx;
    ALTER TABLE tree_versions DROP COLUMN based_on_version;
    ALTER TABLE tree_versions DROP COLUMN publish_confirmation;
    DROP TABLE tree_regression_cases;
  `);
};
