// The ordered list of migrations. Add new files here; never edit one that has shipped.
import type { RunnableMigration } from 'umzug';
import type { QueryInterface } from 'sequelize';
import * as m0001 from './0001-foundation';
import * as m0002 from './0002-cases';
import * as m0003 from './0003-tree-authoring';
import * as m0004 from './0004-repair-orders-and-mail';
import * as m0005 from './0005-temperature-logs';
import * as m0006 from './0006-training-casebook';
import * as m0007 from './0007-sessions';
import * as m0008 from './0008-attachment-idempotency';

export const migrations: RunnableMigration<QueryInterface>[] = [
  { name: '0001-foundation', ...m0001 },
  { name: '0002-cases', ...m0002 },
  { name: '0003-tree-authoring', ...m0003 },
  { name: '0004-repair-orders-and-mail', ...m0004 },
  { name: '0005-temperature-logs', ...m0005 },
  { name: '0006-training-casebook', ...m0006 },
  { name: '0007-sessions', ...m0007 },
  { name: '0008-attachment-idempotency', ...m0008 },
].map(({ name, up, down }) => ({ name, up, down }));
