import { customType } from 'drizzle-orm/mysql-core';

/**
 * MariaDB stores JSON as LONGTEXT, so Drizzle's json() reads strings back. This column
 * serialises on write and parses on read, whichever the driver hands us.
 */
export const jsonColumn = <T>(name: string) =>
  customType<{ data: T; driverData: string }>({
    dataType: () => 'longtext',
    toDriver: (value) => JSON.stringify(value),
    fromDriver: (value) => (typeof value === 'string' ? (JSON.parse(value) as T) : (value as T)),
  })(name);
