// The ordered list of migrations. Add new files here; never edit one that has shipped.
import type { RunnableMigration } from 'umzug';
import type { QueryInterface } from 'sequelize';
import * as m0001 from './0001-foundation';
import * as m0002 from './0002-cases';
import * as m0003 from './0003-tree-authoring';

export const migrations: RunnableMigration<QueryInterface>[] = [
  { name: '0001-foundation', ...m0001 },
  { name: '0002-cases', ...m0002 },
  { name: '0003-tree-authoring', ...m0003 },
].map(({ name, up, down }) => ({ name, up, down }));
