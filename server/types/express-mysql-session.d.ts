// express-mysql-session ships no types; this is the part of its API Seedwake uses.
declare module 'express-mysql-session' {
  import type { Store } from 'express-session';
  interface MySQLStoreOptions {
    createDatabaseTable?: boolean;
    clearExpired?: boolean;
    checkExpirationInterval?: number;
    endConnectionOnClose?: boolean;
  }
  interface MySQLStore extends Store {
    close(): Promise<void>;
  }
  type MySQLStoreClass = new (options: MySQLStoreOptions, connection?: unknown) => MySQLStore;
  export default function factory(session: unknown): MySQLStoreClass;
}
