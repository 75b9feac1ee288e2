// Installs npm dependencies when node_modules is absent or older than the lock file.
import { existsSync, statSync } from 'node:fs';
import { join } from 'node:path';
import { run } from './steps.mjs';

export function ensureNodeModules(root) {
  const marker = join(root, 'node_modules', '.package-lock.json');
  const lock = join(root, 'package-lock.json');
  if (existsSync(marker) && statSync(marker).mtimeMs >= statSync(lock).mtimeMs) return false;
  run('npm', ['ci', '--no-audit', '--no-fund'], { cwd: root });
  return true;
}
