import { afterAll, describe, expect, it } from 'vitest';
import { execFileSync } from 'node:child_process';
import { mkdirSync, writeFileSync } from 'node:fs';
import { join } from 'node:path';
import { getDocument } from 'pdfjs-dist/legacy/build/pdf.mjs';
import { browserLike, signUp, testApp } from '../../support/test-app';
import { buildScenario, waitForProjection } from '../../support/domain';
import { pesticideCautions } from '../../../shared/scenario/cautions';

const t = testApp();
afterAll(() => t.close());

const DEMO_WS = '5eedfa00-0000-4000-8000-000000000001';
const DEMO_BATCH = '5eedfa00-0000-4000-8000-000000000501';

/** Text of every page, extracted with pdf.js (Mozilla's PDF library, a general-purpose reference). */
async function pdfText(pdf: Buffer) {
  const doc = await getDocument({ data: new Uint8Array(pdf), useSystemFonts: false }).promise;
  const pages: string[] = [];
  for (let i = 1; i <= doc.numPages; i++) {
    const content = await (await doc.getPage(i)).getTextContent();
    pages.push(content.items.map((it) => ('str' in it ? it.str : '')).join(' '));
  }
  return { pages: doc.numPages, text: pages.join('\n').replace(/\s+/g, ' ') };
}

const binary = (
  res: NodeJS.ReadableStream & { on: (e: string, f: (c?: Buffer) => void) => void },
  cb: (err: Error | null, body: Buffer) => void,
) => {
  const chunks: Buffer[] = [];
  res.on('data', (c?: Buffer) => chunks.push(c!));
  res.on('end', () => cb(null, Buffer.concat(chunks)));
};

describe('the grower report', () => {
  it('is a valid PDF of the demo comparison with its summary numbers and the pesticide cautions', async () => {
    const grower = browserLike(t.app);
    await grower
      .post('/api/auth/sign-in')
      .send({ email: 'grower@alder-creek.example', password: 'seedwake-demo-2026' });
    const res = await grower
      .get(`/api/workspaces/${DEMO_WS}/batches/${DEMO_BATCH}/report.pdf`)
      .buffer(true)
      .parse(binary as never);
    expect(res.status).toBe(200);
    expect(res.headers['content-type']).toBe('application/pdf');
    const pdf = res.body as Buffer;
    expect(pdf.subarray(0, 5).toString()).toBe('%PDF-');
    const { pages, text } = await pdfText(pdf);
    expect(pages).toBeGreaterThanOrEqual(2);
    expect(pages).toBeLessThanOrEqual(6);
    expect(text).toContain('Hollow Lane ten-year plan');
    expect(text).toContain('seeds/m²');
    for (const caution of pesticideCautions) expect(text).toContain(caution.slice(0, 40));
    // The table's numbers are the batch's own: the no-control median seedbank at the horizon.
    const batch = (await grower.get(`/api/workspaces/${DEMO_WS}/batches/${DEMO_BATCH}`)).body;
    const baseline = batch.find((b: { role: string }) => b.role === 'baseline');
    const median = baseline.result.summary.series.seedbankTotal.q50[10];
    expect(text).toContain(Math.round(median).toLocaleString('en'));
    expect(text).toContain('What one year of letting it seed costs');

    // A rendered page for people to look at (poppler's pdftoppm).
    const out = join('test-output', 'report');
    mkdirSync(out, { recursive: true });
    writeFileSync(join(out, 'demo-report.pdf'), pdf);
    execFileSync('pdftoppm', [
      '-png',
      '-r',
      '70',
      '-f',
      '1',
      '-l',
      '2',
      join(out, 'demo-report.pdf'),
      join(out, 'demo-report-page'),
    ]);
  });

  it('prints US customary units on request and refuses an unfinished comparison', async () => {
    const u = await signUp(t.app, 'rep');
    const { scenario } = await buildScenario(u.agent, u.workspaceId, { replicates: 20000, horizonYears: 60 });
    const launch = (
      await u.agent.post(`/api/workspaces/${u.workspaceId}/scenarios/${scenario.id}/runs`).send({})
    ).body;
    const early = await u.agent.get(`/api/workspaces/${u.workspaceId}/batches/${launch.batchId}/report.pdf`);
    expect(early.status).toBe(400);
    for (const p of launch.projections)
      await u.agent.post(`/api/workspaces/${u.workspaceId}/projections/${p.id}/cancel`);
    for (const p of launch.projections) await waitForProjection(u.agent, u.workspaceId, p.id);

    const owner = browserLike(t.app);
    await owner
      .post('/api/auth/sign-in')
      .send({ email: 'consultant@alder-creek.example', password: 'seedwake-demo-2026' });
    const us = await owner
      .get(`/api/workspaces/${DEMO_WS}/batches/${DEMO_BATCH}/report.pdf?units=us`)
      .buffer(true)
      .parse(binary as never);
    expect(us.status).toBe(200);
    const { text } = await pdfText(us.body as Buffer);
    expect(text).toContain('seeds/ft²');
    expect(text).toContain('per acre');
    expect(
      (await owner.get(`/api/workspaces/${DEMO_WS}/batches/${DEMO_BATCH}/report.pdf?units=furlongs`)).status,
    ).toBe(400);
  });
});
