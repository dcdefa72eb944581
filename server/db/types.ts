import type { Transaction } from 'sequelize';

/**
 * The database transaction a write runs in, as routes and services pass it along. Routes
 * import this name rather than `sequelize` (the lint rule keeps them off the ORM).
 */
export type DbTransaction = Transaction;
