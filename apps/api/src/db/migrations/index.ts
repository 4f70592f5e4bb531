// The ordered list of migrations. Add new files here; never edit one that has shipped.
import type { RunnableMigration } from 'umzug';
import type { QueryInterface } from 'sequelize';
import * as m0001 from './0001-foundation';

export const migrations: RunnableMigration<QueryInterface>[] = [
  { name: '0001-foundation', ...m0001 },
].map(({ name, up, down }) => ({ name, up, down }));
