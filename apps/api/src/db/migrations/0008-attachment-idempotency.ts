// Attachments sent from a tablet's queue carry an idempotency key, so a photo whose reply was
// lost is stored once however often it is sent again. The key is unique per case; the content's
// SHA-256 is kept beside it so a repeat can be told from a different file under the same key.
import type { MigrationFn } from 'umzug';
import type { QueryInterface } from 'sequelize';

export const up: MigrationFn<QueryInterface> = async ({ context: qi }) => {
  await qi.sequelize.query(`
    ALTER TABLE attachments
      ADD COLUMN idempotency_key varchar(100),
      ADD COLUMN sha256 char(64);
    CREATE UNIQUE INDEX attachments_idempotency_key ON attachments (case_id, idempotency_key)
      WHERE idempotency_key IS NOT NULL;
  `);
};

export const down: MigrationFn<QueryInterface> = async ({ context: qi }) => {
  await qi.sequelize.query(`
    DROP INDEX attachments_idempotency_key;
    ALTER TABLE attachments DROP COLUMN sha256, DROP COLUMN idempotency_key;
  `);
};
