import { drizzle } from 'drizzle-orm/mysql2';
import mysql from 'mysql2/promise';
import * as schema from './schema';

export type Database = ReturnType<typeof createDatabase>['db'];

/** One pool per process; Drizzle wraps it. The pool is also handed to the session store. */
export function createDatabase(url: string) {
  const pool = mysql.createPool({
    uri: url,
    connectionLimit: 10,
    dateStrings: false,
    timezone: 'Z',
    charset: 'utf8mb4',
  });
  const db = drizzle(pool, { schema, mode: 'default' });
  return { db, pool };
}

/** A transaction handle; queries accept either so services can group them atomically. */
export type Transaction = Parameters<Parameters<Database['transaction']>[0]>[0];
export type Executor = Database | Transaction;
