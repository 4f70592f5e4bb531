// The one way services reach the database connection and open a transaction.
import type { Sequelize, Transaction, TransactionOptions } from 'sequelize';
import { Workshop } from './models/index';

/** The connection the models were initialised with (any model's will do: they share one). */
export function database(): Sequelize {
  const sequelize = Workshop.sequelize;
  if (!sequelize) throw new Error('Models are not initialised.');
  return sequelize;
}

/** Runs `work` in one transaction: committed when it resolves, rolled back when it throws. */
export function withTransaction<T>(
  work: (transaction: Transaction) => Promise<T>,
  options: TransactionOptions = {},
): Promise<T> {
  return database().transaction(options, work);
}
