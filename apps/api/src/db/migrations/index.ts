// The ordered list of migrations. Add new files here; never edit one that has shipped.
import type { RunnableMigration } from 'umzug';
import type { QueryInterface } from 'sequelize';
import * as m0001 from './0001-foundation';
import * as m0002 from './0002-cases';

export const migrations: RunnableMigration<QueryInterface>[] = [
  { name: '0001-foundation', ...m0001 },
  { name: '0002-cases', ...m0002 },
].map(({ name, up, down }) => ({ name, up, down }));
