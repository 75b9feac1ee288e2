// Small helpers shared by the start and test entry points. Plain Node only: these run
// before any npm dependency is installed.
import { spawnSync } from 'node:child_process';

/** Runs a named set-up step and prints how long it took, so slow steps are visible. */
export async function step(name, fn) {
  const started = Date.now();
  process.stdout.write(`• ${name}…\n`);
  const result = await fn();
  process.stdout.write(`  ${name} done in ${((Date.now() - started) / 1000).toFixed(1)} s\n`);
  return result;
}

/** Runs a command with inherited output; throws with the command line when it fails. */
export function run(cmd, args, options = {}) {
  const res = spawnSync(cmd, args, { stdio: 'inherit', ...options });
  if (res.error) throw new Error(`${cmd} could not start: ${res.error.message}`);
  if (res.status !== 0) throw new Error(`${cmd} ${args.join(' ')} exited with ${res.status}`);
}

/** Like run, but captures output and returns it (used for quick probes). */
export function capture(cmd, args, options = {}) {
  const res = spawnSync(cmd, args, { encoding: 'utf8', ...options });
  return { ok: !res.error && res.status === 0, stdout: res.stdout ?? '', stderr: res.stderr ?? '' };
}

export function isRoot() {
  return typeof process.getuid === 'function' && process.getuid() === 0;
}

/** Whether an executable is on PATH (or in the sbin folders Debian puts daemons in). */
export function hasCommand(name) {
  return capture('sh', ['-c', `command -v ${name} || test -x /usr/sbin/${name}`]).ok;
}

/** Installs Debian packages as root, or stops with the exact command a person should run. */
export function ensureDebianPackage(command, pkg) {
  if (hasCommand(command)) return;
  if (!isRoot()) {
    throw new Error(
      `${command} is missing. Install it with:\n  sudo apt-get update && sudo apt-get install -y ${pkg}`,
    );
  }
  run('apt-get', ['update', '-q']);
  run('apt-get', ['install', '-y', '-q', pkg], {
    env: { ...process.env, DEBIAN_FRONTEND: 'noninteractive' },
  });
}
