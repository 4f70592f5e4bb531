// The outbox's IndexedDB database (through idb): one object store of items keyed by an
// auto-increment `seq`, so the order items were queued in is the order they are read back.
import { openDB, type DBSchema, type IDBPDatabase } from 'idb';
import type { OutboxItem } from './outbox-item';

export const outboxDatabaseName = 'heatpath-outbox';

interface OutboxSchema extends DBSchema {
  items: { key: number; value: OutboxItem };
}

export type OutboxDatabase = IDBPDatabase<OutboxSchema>;

export function openOutboxDatabase(name = outboxDatabaseName): Promise<OutboxDatabase> {
  return openDB<OutboxSchema>(name, 1, {
    upgrade(db) {
      db.createObjectStore('items', { keyPath: 'seq', autoIncrement: true });
    },
  });
}
