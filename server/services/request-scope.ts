import { AsyncLocalStorage } from 'node:async_hooks';
import type { Role } from '../../shared/api/auth';

/**
 * What an API token allows for the request being served: one workspace, at most one
 * role. Sessions carry no scope. Kept per request so every service's requireRole applies
 * it without each call having to pass it along.
 */
export type TokenScope = { workspaceId: string; role: Role };

const storage = new AsyncLocalStorage<TokenScope>();

export const runWithTokenScope = <T>(scope: TokenScope, fn: () => T) => storage.run(scope, fn);
export const currentTokenScope = () => storage.getStore();
