// Field records against the real MariaDB: templates, preview and all-or-nothing import,
// bad files (each refused with a row- or file-level message and nothing saved), the kept
// original, roles and isolation, and adoption into steps, profiles and a field.
import { createHash } from 'node:crypto';
import { readFileSync } from 'node:fs';
import { gzipSync } from 'node:zlib';
import { mean, sampleStandardDeviation } from 'simple-statistics';
import request from 'supertest';
import { afterAll, describe, expect, it } from 'vitest';
import { buildScenario, fieldBody, strategyBody } from '../../support/domain';
import { signUp, testApp } from '../../support/test-app';

const t = testApp();
afterAll(() => t.close());

const demoFile = (name: string) => readFileSync(`models/examples/records/${name}`);
const DOCK = '5eedfa00-0000-4000-8000-000000000101';

type Agent = Awaited<ReturnType<typeof signUp>>['agent'];

async function editorWithField(label = 'records') {
  const u = await signUp(t.app, label);
  const field = (await u.agent.post(`/api/workspaces/${u.workspaceId}/fields`).send(fieldBody())).body;
  return { ...u, field, base: `/api/workspaces/${u.workspaceId}/fields/${field.id}/records` };
}

function send(
  agent: Agent,
  url: string,
  kind: string,
  bytes: Buffer | string,
  filename = 'records.csv',
  check?: string,
) {
  const req = agent.post(url).field('kind', kind);
  if (check !== undefined) req.field('check', check);
  return req.attach('file', Buffer.from(bytes), { filename, contentType: 'text/csv' });
}

/** Rows in the three records tables, to show a refused file left nothing behind. */
async function tableCounts() {
  const out: Record<string, number> = {};
  for (const table of ['record_uploads', 'record_rows', 'record_adoptions']) {
    const [rows] = await t.ctx.pool.query(`SELECT COUNT(*) AS n FROM ${table}`);
    out[table] = Number((rows as { n: number }[])[0].n);
  }
  return out;
}

const GERMINATION_HEADER = 'test_id,temperature_c,seeds_per_dish,day,cumulative_germinated';
const goodGermination = [
  GERMINATION_HEADER,
  'A,20,50,3,10',
  'A,20,50,7,30',
  'B,25,50,3,12',
  'B,25,50,7,25',
].join('\n');

describe('templates', () => {
  it('explain every column and its unit in # lines above the header', async () => {
    const res = await signUp(t.app, 'tpl').then((u) =>
      u.agent.get('/api/records/templates/seedbank-samples'),
    );
    expect(res.status).toBe(200);
    expect(res.headers['content-type']).toMatch(/^text\/csv/);
    expect(res.headers['content-disposition']).toMatch(
      /attachment; filename="?seedwake-seedbank-samples-template\.csv/,
    );
    const lines = res.text.trimEnd().split('\n');
    const header = lines[lines.length - 1];
    expect(header).toBe('field,date,layer,core_diameter_cm,cores,seeds_counted');
    expect(lines.slice(0, -1).every((l) => l.startsWith('#'))).toBe(true);
    for (const column of header.split(',')) expect(lines.some((l) => l.startsWith(`# ${column}`))).toBe(true);
    expect(lines.find((l) => l.startsWith('# core_diameter_cm'))).toContain('[cm]');
    // The template itself is a valid file: its header passes and only the missing data rows are reported.
    const { agent, base } = await editorWithField('tpl2');
    const preview = (await send(agent, `${base}/preview`, 'seedbank-samples', res.text)).body;
    expect(preview.problems.map((p: { message: string }) => p.message)).toEqual([
      'The file has a header but no data rows.',
    ]);
  });
});

describe('bad files are refused with a row- or file-level message and save nothing', () => {
  const cases: {
    name: string;
    kind: string;
    file: Buffer | string;
    line: number | null;
    column: string | null;
    message: RegExp;
  }[] = [
    {
      name: 'wrong delimiter (pipes)',
      kind: 'germination-tests',
      file: GERMINATION_HEADER.replaceAll(',', '|') + '\nA|20|50|3|10\n',
      line: 1,
      column: null,
      message: /no comma, semicolon or tab.*“\|”/,
    },
    {
      name: 'a row split by another separator',
      kind: 'germination-tests',
      file: `${GERMINATION_HEADER}\nA,20,50,3,10\nA;20;50;7;30\n`,
      line: 3,
      column: null,
      message: /has 1 values but the header has 5 columns/,
    },
    {
      name: 'missing column',
      kind: 'germination-tests',
      file: 'test_id,temperature_c,day,cumulative_germinated\nA,20,3,10\n',
      line: 1,
      column: 'seeds_per_dish',
      message: /Missing column seeds_per_dish/,
    },
    {
      name: 'text in a number column',
      kind: 'germination-tests',
      file: `${GERMINATION_HEADER}\nA,twenty,50,3,10\n`,
      line: 2,
      column: 'temperature_c',
      message: /“twenty” is not a number/,
    },
    {
      name: 'negative count',
      kind: 'seedbank-samples',
      file: 'field,date,layer,core_diameter_cm,cores,seeds_counted\nX,2026-03-10,0-5 cm,5,1,-4\n',
      line: 2,
      column: 'seeds_counted',
      message: /must not be negative, got -4/,
    },
    {
      name: 'germinated > seeds',
      kind: 'germination-tests',
      file: `${GERMINATION_HEADER}\nA,20,50,3,10\nA,20,50,7,51\n`,
      line: 3,
      column: 'cumulative_germinated',
      message: /51 germinated is more than the 50 seeds/,
    },
    {
      name: 'a binary file renamed .csv (gzip)',
      kind: 'germination-tests',
      file: gzipSync(Buffer.from(goodGermination)),
      line: 1,
      column: null,
      message: /NUL bytes.*binary file, not CSV text/,
    },
    {
      name: 'a workbook renamed .csv',
      kind: 'germination-tests',
      // The local-file-header signature that opens every zip, hence every .xlsx (PKWARE APPNOTE 4.3.7).
      file: Buffer.concat([
        Buffer.from([0x50, 0x4b, 0x03, 0x04, 0x14, 0x00]),
        Buffer.from('[Content_Types].xml'),
      ]),
      line: null,
      column: null,
      message: /Excel workbook \(\.xlsx\).*CSV UTF-8/,
    },
    {
      name: 'an 8-bit code page instead of UTF-8',
      kind: 'germination-tests',
      // "°" in Windows-1252 is the single byte 0xB0, which is not valid UTF-8 (RFC 3629).
      file: Buffer.concat([
        Buffer.from('test_id,temperature ('),
        Buffer.from([0xb0]),
        Buffer.from('C),seeds_per_dish,day,cumulative_germinated\nA,20,50,3,10\n'),
      ]),
      line: 1,
      column: null,
      message: /not UTF-8 text/,
    },
  ];

  for (const c of cases) {
    it(c.name, async () => {
      const { agent, base } = await editorWithField('bad');
      const before = await tableCounts();
      const preview = await send(agent, `${base}/preview`, c.kind, c.file);
      expect(preview.status).toBe(200);
      expect(preview.body.importable).toBe(false);
      expect(preview.body.estimates).toBeNull();
      const problem = preview.body.problems.find((p: { message: string }) => c.message.test(p.message));
      expect(problem, JSON.stringify(preview.body.problems)).toBeDefined();
      expect(problem).toMatchObject({ line: c.line, column: c.column });
      const imported = await send(agent, `${base}/uploads`, c.kind, c.file);
      expect(imported.status).toBe(400);
      expect(imported.body.error.message).toMatch(/nothing was saved/);
      expect(Object.values(imported.body.error.fields).some((m) => c.message.test(String(m)))).toBe(true);
      expect(await tableCounts()).toEqual(before);
    });
  }

  it('a 50 MB file: 413 with a clear message', async () => {
    const { agent, base } = await editorWithField('huge');
    const before = await tableCounts();
    const huge = Buffer.alloc(50 * 1024 * 1024, 'A,20,50,3,10\n');
    huge.write(`${GERMINATION_HEADER}\n`, 0);
    const res = await send(agent, `${base}/uploads`, 'germination-tests', huge, 'huge.csv');
    expect(res.status).toBe(413);
    expect(res.body.error).toMatchObject({ code: 'too_large' });
    expect(res.body.error.message).toMatch(/larger than 10 MB/);
    expect(await tableCounts()).toEqual(before);
  });

  it('one bad row among good ones: the whole file is refused (all or nothing)', async () => {
    const { agent, base } = await editorWithField('atomic');
    const rows = Array.from({ length: 40 }, (_, i) => `D${i},20,50,7,${i % 50}`);
    rows[27] = 'D27,20,50,7,x';
    const before = await tableCounts();
    const res = await send(
      agent,
      `${base}/uploads`,
      'germination-tests',
      [GERMINATION_HEADER, ...rows].join('\n'),
    );
    expect(res.status).toBe(400);
    // Line 29 of the file: the header is line 1, D27 the 28th data row.
    expect(res.body.error.fields).toEqual({
      'line 29 cumulative_germinated': '“x” is not a number; cumulative germinated is a whole number',
    });
    expect(await tableCounts()).toEqual(before);
    expect((await agent.get(`${base}/uploads`)).body).toEqual([]);
  });

  it('the same file twice into one field: 409, the second saves nothing', async () => {
    const { agent, base } = await editorWithField('twice');
    expect((await send(agent, `${base}/uploads`, 'germination-tests', goodGermination)).status).toBe(201);
    const before = await tableCounts();
    const again = await send(agent, `${base}/uploads`, 'germination-tests', goodGermination, 'renamed.csv');
    expect(again.status).toBe(409);
    expect(again.body.error.message).toMatch(/already imported/);
    expect(await tableCounts()).toEqual(before);
  });
});

describe('preview: units and separators', () => {
  it('converts °F and inches with the exact factors and reads a semicolon file with decimal commas', async () => {
    const { agent, base } = await editorWithField('units');
    // Germination tested at 59, 68 and 77 °F, i.e. 15, 20 and 25 °C — common practice, no published
    // source; t/°C = (t/°F − 32)/1.8 (NIST SP 811, Appendix B).
    const germ = [
      'test_id,temperature_f,seeds_per_dish,day,cumulative_germinated',
      'A,59,50,7,20',
      'B,68,50,7,30',
      'C,77,50,7,25',
    ].join('\n');
    const g = (await send(agent, `${base}/preview`, 'germination-tests', germ)).body;
    expect(g.importable).toBe(true);
    expect(g.rows.map((r: { values: { temperatureC: number } }) => r.values.temperatureC)).toEqual([
      15, 20, 25,
    ]);
    expect(g.columns.find((c: { key: string }) => c.key === 'temperatureC')).toMatchObject({
      fileUnit: '°F',
      unit: '°C',
    });
    expect(g.estimates.germination[0].best.temperatureC).toBe(20);
    // 1 in = 2.54 cm exactly (NIST SP 811, Appendix B); a decimal comma in a semicolon file.
    const cores = [
      'field;date;layer;core_diameter_in;cores;seeds_counted',
      'Home;2026-03-10;0-5 cm;1,5;2;7',
      'Home;2026-03-10;0-5 cm;1,5;2;9',
    ].join('\n');
    const c = (await send(agent, `${base}/preview`, 'seedbank-samples', cores)).body;
    expect(c.importable, JSON.stringify(c.problems)).toBe(true);
    expect(c.delimiter).toBe('semicolon');
    expect(c.rows[0].values.coreDiameterCm).toBeCloseTo(3.81, 12);
    expect(c.warnings.some((w: string) => /another field|filed under/.test(w))).toBe(true);
    // 16 seeds in 4 cores of 3.81 cm: 16 / (4·π·0.01905²) seeds/m² (area of a circle, πr²).
    const density = c.estimates.seedbank.years[0].layers[0];
    expect(density.perM2.estimate).toBeCloseTo(16 / (4 * Math.PI * 0.01905 ** 2), 6);
    // ft² from m² by 0.09290304 m²/ft² (NIST SP 811).
    expect(density.perFt2.estimate).toBeCloseTo(density.perM2.estimate * 0.09290304, 9);
    // A preview saves nothing.
    expect((await agent.get(`${base}/uploads`)).body).toEqual([]);
  });
});

describe('the kept original', () => {
  it('downloads byte for byte with its SHA-256, even past the 2 MiB slices it is stored in', async () => {
    const { agent, base } = await editorWithField('original');
    // A 3 MB header comment (comments are skipped) makes the stored bytes span two statements.
    const bytes = Buffer.from(
      `${'# padding comment line to make a large file\n'.repeat(70_000)}${goodGermination}\n`,
    );
    expect(bytes.length).toBeGreaterThan(3_000_000);
    const res = await send(agent, `${base}/uploads`, 'germination-tests', bytes, 'big dish test °C.csv');
    expect(res.status).toBe(201);
    const sha = createHash('sha256').update(bytes).digest('hex');
    expect(res.body).toMatchObject({
      filename: 'big dish test °C.csv',
      bytes: bytes.length,
      sha256: sha,
      rowCount: 4,
    });
    const file = await agent
      .get(`${base}/uploads/${res.body.id}/file`)
      .buffer(true)
      .parse((r, done) => {
        const chunks: Buffer[] = [];
        r.on('data', (c: Buffer) => chunks.push(c));
        r.on('end', () => done(null, Buffer.concat(chunks)));
      });
    expect(file.status).toBe(200);
    expect(Buffer.compare(file.body as Buffer, bytes)).toBe(0);
    // RFC 9530 Repr-Digest carries the SHA-256 as base64 between colons.
    expect(file.headers['repr-digest']).toBe(
      `sha-256=:${createHash('sha256').update(bytes).digest('base64')}:`,
    );
    expect(file.headers['content-disposition']).toMatch(/attachment/);
  });
});

describe('roles and isolation', () => {
  it('viewers read what is shared with them; only editors upload, adopt or remove; other workspaces get 404', async () => {
    const owner = await signUp(t.app, 'recOwner');
    const ws = owner.workspaceId;
    const { field, strategy, scenario } = await buildScenario(owner.agent, ws);
    const base = `/api/workspaces/${ws}/fields/${field.id}/records`;
    const up = await send(owner.agent, `${base}/uploads`, 'germination-tests', goodGermination);
    expect(up.status).toBe(201);
    const viewer = await signUp(t.app, 'recViewer');
    await owner.agent.post(`/api/workspaces/${ws}/members`).send({ email: viewer.email, role: 'viewer' });
    // Not shared yet: the field is hidden from the viewer.
    expect((await viewer.agent.get(`${base}/uploads`)).status).toBe(404);
    const run = (await owner.agent.post(`/api/workspaces/${ws}/scenarios/${scenario.id}/runs`).send({})).body;
    expect(
      (await owner.agent.put(`/api/workspaces/${ws}/batches/${run.batchId}/shares/${viewer.user.id}`)).status,
    ).toBe(200);

    const v = viewer.agent;
    expect((await v.get(`${base}/uploads`)).body.map((u: { id: string }) => u.id)).toEqual([up.body.id]);
    expect((await v.get(`${base}/estimates`)).status).toBe(200);
    expect((await v.get(`${base}/adoptions`)).status).toBe(200);
    expect((await v.get(`${base}/uploads/${up.body.id}/file`)).status).toBe(200);
    expect((await v.get(`/api/workspaces/${ws}/strategies/${strategy.id}/sources`)).status).toBe(200);
    const before = await tableCounts();
    expect((await send(v, `${base}/preview`, 'germination-tests', goodGermination)).status).toBe(403);
    expect((await send(v, `${base}/uploads`, 'germination-tests', `${goodGermination}\n`)).status).toBe(403);
    const key = (await v.get(`${base}/estimates`)).body.germination[0].temperatures[0].adopt.key;
    const adopt = {
      estimateKey: key,
      target: { kind: 'profile', profileId: DOCK, parameter: 'germination.deep' },
    };
    expect((await v.post(`${base}/adoptions`).send(adopt)).status).toBe(403);
    expect((await v.delete(`${base}/uploads/${up.body.id}`)).status).toBe(403);
    expect(await tableCounts()).toEqual(before);

    const stranger = await signUp(t.app, 'recStranger');
    for (const path of [
      `${base}/uploads`,
      `${base}/estimates`,
      `${base}/adoptions`,
      `${base}/uploads/${up.body.id}/file`,
    ]) {
      expect((await stranger.agent.get(path)).status).toBe(404);
    }
    expect(
      (await send(stranger.agent, `${base}/uploads`, 'germination-tests', `${goodGermination}\n\n`)).status,
    ).toBe(404);
    // A field of another workspace under one's own workspace id is not found either.
    expect(
      (await stranger.agent.get(`/api/workspaces/${stranger.workspaceId}/fields/${field.id}/records/uploads`))
        .status,
    ).toBe(404);

    expect((await owner.agent.delete(`${base}/uploads/${up.body.id}`)).status).toBe(204);
    expect((await owner.agent.get(`${base}/uploads`)).body).toEqual([]);
    expect((await request(t.app).get(`${base}/uploads`)).status).toBe(401);
  });
});

describe('adoption', () => {
  it('puts an efficacy into a strategy step and records the source note', async () => {
    const { agent, workspaceId, field, base } = await editorWithField('adoptStep');
    const strategy = (
      await agent.post(`/api/workspaces/${workspaceId}/strategies`).send(strategyBody(field.id))
    ).body;
    const trial = demoFile('hollow-lane-efficacy-trial.csv');
    const up = await send(
      agent,
      `${base}/uploads`,
      'efficacy-trials',
      trial,
      'hollow-lane-efficacy-trial.csv',
      'untreated check',
    );
    expect(up.status, JSON.stringify(up.body)).toBe(201);
    const estimates = (await agent.get(`${base}/estimates`)).body;
    const timing = estimates.efficacy[0].timings.find((x: { timing: string }) => x.timing === '4 WAT');
    const glyphosate = timing.treatments.find(
      (x: { treatment: string }) => x.treatment === 'glyphosate spot',
    );

    // Abbott (1925, J. Econ. Entomol. 18:265–267): % control = 100·(1 − treated/check), here per block
    // against that block's check, then mean and sample SD across the four blocks (simple-statistics).
    const rows = trial
      .toString()
      .split('\n')
      .filter((l) => l.startsWith('Hollow Lane 2025,') && l.includes(',4 WAT,'))
      .map((l) => l.split(','));
    const plot = (treatment: string, block: string) =>
      Number(rows.find((r) => r[1] === treatment && r[2] === block)![4]);
    const perBlock = ['I', 'II', 'III', 'IV'].map(
      (b) => 100 * (1 - plot('glyphosate spot', b) / plot('untreated check', b)),
    );
    expect(glyphosate.meanPercentControl).toBeCloseTo(mean(perBlock), 10);
    expect(glyphosate.sdPercentControl).toBeCloseTo(sampleStandardDeviation(perBlock), 10);

    const stepIndex = 1;
    const res = await agent.post(`${base}/adoptions`).send({
      estimateKey: glyphosate.adopt.key,
      target: { kind: 'step', strategyId: strategy.id, stepIndex },
    });
    expect(res.status, JSON.stringify(res.body)).toBe(201);
    const after = (await agent.get(`/api/workspaces/${workspaceId}/strategies/${strategy.id}`)).body;
    expect(after.strategy.steps[stepIndex].efficacy.mean).toBeCloseTo(mean(perBlock) / 100, 10);
    expect(after.strategy.steps[stepIndex].efficacy.sd).toBeCloseTo(
      sampleStandardDeviation(perBlock) / 100,
      10,
    );
    const sha = createHash('sha256').update(trial).digest('hex');
    const note = res.body.note as string;
    expect(note).toContain(`From upload hollow-lane-efficacy-trial.csv (sha256 ${sha.slice(0, 12)}…)`);
    expect(note).toMatch(/% control \d+ ± \d+ % .* at 4 WAT/);
    expect(note).toContain(`/w/${workspaceId}/fields/${field.id}/records`);
    expect(res.body).toMatchObject({
      targetKind: 'step',
      path: `steps[${stepIndex}].efficacy`,
      current: true,
    });
    const sources = (await agent.get(`/api/workspaces/${workspaceId}/strategies/${strategy.id}/sources`))
      .body;
    expect(sources).toEqual({ [`steps[${stepIndex}].efficacy`]: note });

    // Editing the step afterwards supersedes the note rather than leaving it on a changed step.
    const edited = structuredClone(after.strategy);
    edited.steps[stepIndex].efficacy = { mean: 0.5, sd: 0.1 };
    await agent
      .put(`/api/workspaces/${workspaceId}/strategies/${strategy.id}`)
      .send({ ...strategyBody(field.id), strategy: edited });
    expect(
      (await agent.get(`/api/workspaces/${workspaceId}/strategies/${strategy.id}/sources`)).body,
    ).toEqual({});
    expect((await agent.get(`${base}/adoptions`)).body[0].current).toBe(false);

    // A step index past the end is named in the error.
    const bad = await agent.post(`${base}/adoptions`).send({
      estimateKey: glyphosate.adopt.key,
      target: { kind: 'step', strategyId: strategy.id, stepIndex: 40 },
    });
    expect(bad.status).toBe(400);
    expect(bad.body.error.fields['target.stepIndex']).toBeDefined();
  });

  it('refuses a built-in profile with a clear message, and writes the source note into a copy', async () => {
    const { agent, workspaceId, base } = await editorWithField('adoptProfile');
    for (const f of ['hollow-lane-soil-cores-2023-2025.csv', 'hollow-lane-soil-cores.csv']) {
      expect((await send(agent, `${base}/uploads`, 'seedbank-samples', demoFile(f), f)).status).toBe(201);
    }
    const estimates = (await agent.get(`${base}/estimates`)).body;
    const decay = estimates.seedbank.decay[0];
    expect(decay.layer).toBe('0-5 cm');
    // Log-linear decay: 1 − e^b with b the least-squares slope of ln density on year (checked against
    // simple-statistics' linear regression).
    const { linearRegression } = await import('simple-statistics');
    const { m } = linearRegression(
      decay.observations.map((o: { year: number; seedsPerM2: number }) => [o.year, Math.log(o.seedsPerM2)]),
    );
    expect(decay.result.decayRate.estimate).toBeCloseTo(1 - Math.exp(m), 12);

    const before = await tableCounts();
    const target = { kind: 'profile', profileId: DOCK, parameter: 'seedDecay.shallow' };
    const refused = await agent.post(`${base}/adoptions`).send({ estimateKey: decay.adopt.key, target });
    expect(refused.status).toBe(403);
    expect(refused.body.error.message).toMatch(/built-in profile and read-only; copy it first/);
    expect(await tableCounts()).toEqual(before);

    const copy = (await agent.post(`/api/workspaces/${workspaceId}/profiles/${DOCK}/copy`)).body;
    const res = await agent
      .post(`${base}/adoptions`)
      .send({ estimateKey: decay.adopt.key, target: { ...target, profileId: copy.id } });
    expect(res.status, JSON.stringify(res.body)).toBe(201);
    const profile = (await agent.get(`/api/workspaces/${workspaceId}/profiles/${copy.id}`)).body;
    expect(profile.profile.seedDecay.shallow).toBeCloseTo(1 - Math.exp(m), 12);
    expect(profile.sources['seedDecay.shallow']).toBe(res.body.note);
    expect(res.body.note).toMatch(
      /^From uploads hollow-lane-soil-cores-2023-2025\.csv \(sha256 [0-9a-f]{12}…\), hollow-lane-soil-cores\.csv/,
    );
    // An efficacy does not fit a profile parameter.
    const trial = await send(
      agent,
      `${base}/uploads`,
      'efficacy-trials',
      demoFile('hollow-lane-efficacy-trial.csv'),
      'trial.csv',
      'untreated check',
    );
    expect(trial.status).toBe(201);
    const eff = (await agent.get(`${base}/estimates`)).body.efficacy[0].timings[0].treatments[0].adopt.key;
    const wrong = await agent
      .post(`${base}/adoptions`)
      .send({ estimateKey: eff, target: { ...target, profileId: copy.id } });
    expect(wrong.status).toBe(400);
    expect(wrong.body.error.message).toMatch(/goes into a strategy step/);
  });

  it("sets the field's initial seedbank from its cores", async () => {
    const { agent, workspaceId, field, base } = await editorWithField('adoptField');
    const cores = demoFile('hollow-lane-soil-cores.csv');
    expect((await send(agent, `${base}/uploads`, 'seedbank-samples', cores, 'cores.csv')).status).toBe(201);
    const year = (await agent.get(`${base}/estimates`)).body.seedbank.years[0];
    // seeds/m² = Σ seeds / (n cores · π (d/2)²), d = 5 cm (area of a circle).
    const lines = cores
      .toString()
      .split('\n')
      .filter((l) => l.startsWith('Hollow Lane block,'));
    const expected = (layer: string) => {
      const mine = lines.filter((l) => l.split(',')[2] === layer);
      return mine.reduce((s, l) => s + Number(l.split(',')[5]), 0) / (mine.length * Math.PI * 0.025 ** 2);
    };
    const res = await agent.post(`${base}/adoptions`).send({
      estimateKey: year.adopt.key,
      target: { kind: 'field-seedbank', shallowLayers: ['0-5 cm'], deepLayers: ['5-15 cm'] },
    });
    expect(res.status, JSON.stringify(res.body)).toBe(201);
    const after = (await agent.get(`/api/workspaces/${workspaceId}/fields/${field.id}`)).body;
    expect(after.setting.initialSeedbank.shallow).toBeCloseTo(expected('0-5 cm'), 8);
    expect(after.setting.initialSeedbank.deep).toBeCloseTo(expected('5-15 cm'), 8);
    expect(after.notes).toContain('Initial seedbank shallow');
    expect(res.body.note).toContain('cores.csv (sha256');
  });
});
