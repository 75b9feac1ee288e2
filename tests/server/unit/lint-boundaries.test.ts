import { describe, expect, it } from 'vitest';
// @ts-expect-error plain JS module shared with the ESLint config
import { allowed, layerOf } from '../../lint/boundaries-rule.js';

// The import-boundary rule of DEVELOPERS.md, checked case by case.
describe('import boundaries', () => {
  it('classifies files into layers', () => {
    expect(layerOf('models/random/stream.ts')).toBe('models');
    expect(layerOf('client/src/features/auth/api.ts')).toBe('client/features/auth');
    expect(layerOf('client/src/shared/lib/units.ts')).toBe('client/shared');
    expect(layerOf('client/src/app/router.tsx')).toBe('client/app');
  });
  it('allows only one-way imports', () => {
    expect(allowed('models', 'shared')).toBe(false);
    expect(allowed('shared', 'models')).toBe(true);
    expect(allowed('shared', 'server')).toBe(false);
    expect(allowed('server', 'shared')).toBe(true);
    expect(allowed('server', 'client/app')).toBe(false);
    expect(allowed('client/features/auth', 'client/features/workspaces')).toBe(false);
    expect(allowed('client/features/auth', 'client/shared')).toBe(true);
    expect(allowed('client/shared', 'client/features/auth')).toBe(false);
    expect(allowed('client/app', 'client/features/auth')).toBe(true);
    expect(allowed('client/features/auth', 'client/app')).toBe(false);
  });
});
