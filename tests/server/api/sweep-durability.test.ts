// Durability of the sweep queue with real worker processes (`npm run worker`, i.e.
// server/worker-main.ts) against the test MariaDB: one is killed with SIGKILL in the middle
// of a chunk; its lease runs out, the other takes the chunk over, and the sweep finishes
// with every point exactly once and the same numbers as an uninterrupted run. The claim log
// shows no chunk was ever held by two workers at once or completed twice.
import { spawn, type ChildProcess } from 'node:child_process';
import mysql from 'mysql2/promise';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { SweepBody } from '../../../shared/api/sweeps';
import { parseScenario } from '../../../shared/scenario/parse';
import { runLocalSweep } from '../../../server/sweeps/local-run';
import { buildScenario } from '../../support/domain';
import { signUp, testApp } from '../../support/test-app';

const LEASE_SECONDS = 2;
// 3 points of 500 replicates × 10 years per chunk: 16 chunks of a fraction of a second each.
const t = testApp({ sweeps: { chunkReplicateYears: 15_000 } });
let db: mysql.Connection;
const children: ChildProcess[] = [];

type Worker = { child: ChildProcess; id: string; exited: Promise<void> };

/**
 * `npm run worker` is `tsx server/worker-main.ts`; node is started with tsx's loader directly so
 * the signal reaches the worker itself rather than a launcher in front of it.
 */
function startWorker(): Promise<Worker> {
  const child = spawn(process.execPath, ['--import', 'tsx', 'server/worker-main.ts'], {
    env: {
      ...process.env,
      SWEEP_LEASE_SECONDS: String(LEASE_SECONDS),
      SWEEP_THREADS: '1',
      LOG_LEVEL: 'info',
    },
    stdio: ['ignore', 'pipe', 'inherit'],
  });
  children.push(child);
  const exited = new Promise<void>((r) => child.once('exit', () => r()));
  return new Promise((resolve, reject) => {
    let buffer = '';
    child.stdout!.on('data', (data: Buffer) => {
      buffer += data.toString();
      const started = buffer.split('\n').find((l) => l.includes('sweep worker started'));
      if (started) resolve({ child, id: JSON.parse(started).worker, exited });
    });
    child.once('exit', (code) => reject(new Error(`worker exited early (${code})`)));
  });
}

const rows = async <T>(q: string, params: unknown[] = []) => (await db.query(q, params))[0] as T[];
const sleep = (ms: number) => new Promise((r) => setTimeout(r, ms));

beforeAll(async () => {
  db = await mysql.createConnection({ uri: process.env.DATABASE_URL!, timezone: 'Z' });
});
afterAll(async () => {
  for (const c of children) if (c.exitCode === null && c.signalCode === null) c.kill('SIGKILL');
  await db.end();
  await t.close();
});

describe('two worker processes on one sweep', () => {
  it('survive a SIGKILL of one: every point once, results as an uninterrupted run', async () => {
    const u = await signUp(t.app, 'durable');
    const { scenario, strategy } = await buildScenario(u.agent, u.workspaceId);
    const body: SweepBody = {
      name: 'Durability',
      scenarioId: scenario.id,
      strategyId: strategy.id,
      parameters: [
        { path: 'profile.seedDecay.shallow', min: 0.05, max: 0.3 },
        { path: 'strategy.steps[2].efficacy.mean', min: 0.6, max: 0.95 },
      ],
      design: { kind: 'latin-hypercube', points: 48 },
      outcomes: ['seedbank', 'plants', 'depletion', 'decline90', 'npv'],
      outcomeYear: 10,
      replicatesPerPoint: 500,
      seed: 9001,
    };
    const url = `/api/workspaces/${u.workspaceId}/sweeps`;
    const sweep = (await u.agent.post(url).send(body).expect(201)).body;
    // Held back until both workers are up, so both take part from the start.
    await u.agent.post(`${url}/${sweep.id}/pause`).expect(200);
    const [a, b] = await Promise.all([startWorker(), startWorker()]);
    await u.agent.post(`${url}/${sweep.id}/resume`).expect(200);

    // Kill A while it holds a chunk. It is stopped first (SIGSTOP) so that what it holds can
    // be read without a race; if it happened to hold nothing, it goes on and we look again.
    let held: { chunk_index: number }[] = [];
    for (let tries = 0; held.length === 0; tries++) {
      if (tries > 400) throw new Error('worker A never held a chunk after finishing one');
      await sleep(25);
      const [{ done }] = await rows<{ done: number }>(
        `SELECT COUNT(*) AS done FROM sweep_claims WHERE sweep_id = ? AND worker_id = ? AND outcome = 'completed'`,
        [sweep.id, a.id],
      );
      if (done < 1) continue;
      a.child.kill('SIGSTOP');
      await sleep(200);
      held = await rows(
        `SELECT chunk_index FROM sweep_chunks WHERE sweep_id = ? AND worker_id = ? AND status = 'claimed'`,
        [sweep.id, a.id],
      );
      if (held.length === 0) a.child.kill('SIGCONT');
    }
    a.child.kill('SIGKILL');
    await a.exited;

    for (let i = 0; ; i++) {
      const [{ status }] = await rows<{ status: string }>('SELECT status FROM sweeps WHERE id = ?', [
        sweep.id,
      ]);
      if (status === 'done') break;
      if (i > 600) throw new Error(`sweep still ${status}`);
      await sleep(100);
    }
    b.child.kill('SIGTERM');
    await b.exited;

    // Every point exactly once: the key (sweep_id, point_index) forbids duplicates, and the
    // count equals the design's points.
    const stored = await rows<{ point_index: number }>(
      'SELECT point_index FROM sweep_results WHERE sweep_id = ? ORDER BY point_index',
      [sweep.id],
    );
    expect(stored.map((r) => r.point_index)).toEqual([...Array(48).keys()]);

    // The same numbers as one uninterrupted run in this process (the command line's runner).
    const results = (await u.agent.get(`${url}/${sweep.id}/results.json`)).body;
    const base = parseScenario(results.base);
    if (!base.ok) throw new Error('base must be a valid scenario');
    const { name: _n, scenarioId: _s, strategyId: _t, ...spec } = body;
    const local = await runLocalSweep(base.scenario, spec, 2);
    if (!local.ok) throw new Error('the definition must plan');
    expect(results.points).toEqual(JSON.parse(JSON.stringify(local.result.points)));

    type ClaimRow = {
      id: number;
      chunk_index: number;
      worker_id: string;
      claimed_at: Date;
      previous_worker_id: string | null;
      previous_lease_expires_at: Date | null;
      finished_at: Date | null;
      outcome: string | null;
    };
    const claims = await rows<ClaimRow>('SELECT * FROM sweep_claims WHERE sweep_id = ? ORDER BY id', [
      sweep.id,
    ]);
    const [{ chunks }] = await rows<{ chunks: number }>(
      'SELECT total_chunks AS chunks FROM sweeps WHERE id = ?',
      [sweep.id],
    );
    expect(new Set(claims.map((c) => c.worker_id))).toEqual(new Set([a.id, b.id]));
    for (let chunk = 0; chunk < chunks; chunk++) {
      const mine = claims.filter((c) => c.chunk_index === chunk);
      // Completed by exactly one worker.
      expect(mine.filter((c) => c.outcome === 'completed')).toHaveLength(1);
      // A later claim starts only after the earlier one was handed back or its lease ran out,
      // never while another worker held the chunk, and never after it was completed.
      for (let i = 1; i < mine.length; i++) {
        const before = mine[i - 1];
        const after = mine[i];
        if (before.outcome === 'released') {
          expect(after.claimed_at.getTime()).toBeGreaterThanOrEqual(before.finished_at!.getTime());
        } else {
          // Taken from a worker that died (no end) or was too slow to beat (lost): only once
          // that worker's lease had run out.
          expect(before.outcome === null || before.outcome === 'lost').toBe(true);
          expect(after.previous_worker_id).toBe(before.worker_id);
          expect(after.claimed_at.getTime()).toBeGreaterThan(after.previous_lease_expires_at!.getTime());
        }
      }
    }
    // What A held when it died was taken over by B after A's lease ran out, and finished by B.
    for (const { chunk_index } of held) {
      const mine = claims.filter((c) => c.chunk_index === chunk_index);
      const dead = mine.find((c) => c.worker_id === a.id && c.outcome === null)!;
      expect(dead).toBeDefined();
      const next = mine.find((c) => c.id > dead.id)!;
      expect(next).toMatchObject({ worker_id: b.id, previous_worker_id: a.id, outcome: 'completed' });
    }
  });
});
