// The grower report: a comparison printed as a PDF a grower can read on paper, in black
// and white — field and profile, strategies as plain timelines, the seedbank chart, the
// summary table with units, the let-it-seed payoff, assumptions and their sources, the
// run seeds, and the pesticide cautions. Fonts ship with the app (@fontsource).
import PDFDocument from 'pdfkit';
import { createRequire } from 'node:module';
import type { ProjectionSummary } from '../../models/projection/summarise';
import type { Scenario } from '../../models/scenario/types';
import { comparisonRows, letItSeedPayoff, type ComparedRun } from '../../shared/projection/comparison';
import { describeStep } from '../../shared/scenario/describe-step';
import { hasChemicalStep, pesticideCautions } from '../../shared/scenario/cautions';
import { parameterCatalogue } from '../../shared/scenario/parameters';
import { drawChart } from './chart';
import { fmt, reportUnits, type ReportUnits } from './units';

const require = createRequire(import.meta.url);
const FONT = require.resolve('@fontsource/ibm-plex-sans/files/ibm-plex-sans-latin-400-normal.woff');
const BOLD = require.resolve('@fontsource/ibm-plex-sans/files/ibm-plex-sans-latin-700-normal.woff');

export type ReportInput = {
  workspaceName: string;
  scenarioName: string;
  crop: string | null;
  profileSources: Record<string, string>;
  runs: {
    id: string;
    label: string;
    role: ComparedRun['role'];
    seed: number;
    snapshot: Scenario;
    summary: ProjectionSummary;
  }[];
  units: ReportUnits;
  generatedAt: Date;
};

export function growerReport(input: ReportInput): Promise<Buffer> {
  const u = reportUnits(input.units);
  const doc = new PDFDocument({
    size: 'A4',
    margin: 50,
    info: { Title: `${input.scenarioName} — Seedwake report`, Author: 'Seedwake' },
    bufferPages: true,
  });
  doc.registerFont('text', FONT);
  doc.registerFont('bold', BOLD);
  const chunks: Buffer[] = [];
  doc.on('data', (c: Buffer) => chunks.push(c));
  const done = new Promise<Buffer>((resolve) => doc.on('end', () => resolve(Buffer.concat(chunks))));

  const compared = input.runs.filter((r) => r.role !== 'let-it-seed');
  const rows = comparisonRows(
    compared.map((r) => ({ id: r.id, label: r.label, role: r.role, summary: r.summary })),
  );
  const first = input.runs[0].snapshot;
  const H = first.horizonYears;
  const money = (perHa: number) => `${fmt(u.money(perHa))} ${u.moneyUnit}`;
  const h1 = (t: string) => doc.font('bold').fontSize(18).fillColor('#000').text(t);
  const h2 = (t: string) =>
    doc.moveDown(0.8).font('bold').fontSize(12.5).fillColor('#000').text(t).moveDown(0.2);
  const p = (t: string, size = 9.5) =>
    doc.font('text').fontSize(size).fillColor('#000').text(t, { lineGap: 1.5 });

  h1(input.scenarioName);
  p(
    `${input.workspaceName} · field ${first.field.name}${input.crop ? ` (${input.crop})` : ''}, ${fmt(u.area(first.field.areaHa), 2)} ${u.areaUnit} · weed: ${first.profile.name} (${first.profile.lifeForm}) · ${H}-year projection · ${first.replicates} replicates per strategy · printed ${input.generatedAt.toISOString().slice(0, 10)}`,
    9,
  );

  const best = [...rows]
    .filter((r) => r.role === 'strategy')
    .sort((a, b) => a.seedbank.at(-1)!.median - b.seedbank.at(-1)!.median)[0];
  const baseline = rows.find((r) => r.role === 'baseline');
  h2('In short');
  if (best && baseline) {
    p(
      `Doing nothing leaves a median of ${fmt(u.density(baseline.seedbank.at(-1)!.median))} ${u.densityUnit} in the seedbank after ${H} years. ` +
        `"${best.label}" leaves the fewest: ${fmt(u.density(best.seedbank.at(-1)!.median))} ${u.densityUnit} (90 % of runs between ${fmt(u.density(best.seedbank.at(-1)!.q05))} and ${fmt(u.density(best.seedbank.at(-1)!.q95))}), ` +
        `with a ${fmt(best.depletionAtHorizon * 100)} % chance of a functionally depleted seedbank (below ${fmt(u.density(first.depletionThreshold), 2)} ${u.densityUnit}) and a net present value ${money(best.npvVsNoControl ?? 0)} ${best.npvVsNoControl !== null && best.npvVsNoControl >= 0 ? 'better' : 'worse'} than doing nothing.`,
    );
  }

  h2(`Seedbank by year (median and 90 % band, ${u.densityUnit})`);
  const chartTop = doc.y + 14;
  drawChart(
    doc,
    100,
    chartTop,
    420,
    170,
    compared.map((r) => ({
      label: r.label,
      median: r.summary.series.seedbankTotal.q50.map(u.density),
      q05: r.summary.series.seedbankTotal.q05.map(u.density),
      q95: r.summary.series.seedbankTotal.q95.map(u.density),
    })),
    u.densityUnit,
    'text',
  );
  doc.x = 50;
  doc.y = chartTop + 195;

  h2('Summary');
  const cols = [
    { title: 'Strategy', w: 120 },
    ...rows[0].seedbank.map((s) => ({ title: `Seedbank yr ${s.year}\n${u.densityUnit}`, w: 62 })),
    { title: `P(depleted)\nyr ${H}`, w: 48 },
    { title: '90 % decline\n(years)', w: 48 },
    { title: `Cost\n${u.moneyUnit}`, w: 50 },
    { title: 'Yield loss\n% / yr', w: 42 },
    { title: `NPV vs nothing\n${u.moneyUnit}`, w: 62 },
  ];
  const cells = (r: (typeof rows)[number]) => [
    r.label,
    ...r.seedbank.map(
      (s) => `${fmt(u.density(s.median))}\n${fmt(u.density(s.q05))}–${fmt(u.density(s.q95))}`,
    ),
    `${fmt(r.depletionAtHorizon * 100)} %`,
    r.declineYears === null ? `> ${H}` : fmt(r.declineYears, 1),
    fmt(u.money(r.cumulativeCost)),
    fmt(r.yieldLossPercent, 1),
    r.npvVsNoControl === null ? '(reference)' : fmt(u.money(r.npvVsNoControl)),
  ];
  const table = (header: { title: string; w: number }[], body: string[][]) => {
    let y = doc.y;
    const line = (values: string[], font: string) => {
      let x = 50;
      const heights = values.map((v, i) =>
        doc
          .font(font)
          .fontSize(7.5)
          .heightOfString(v, { width: header[i].w - 4 }),
      );
      const hgt = Math.max(...heights) + 4;
      if (y + hgt > doc.page.height - 60) {
        doc.addPage();
        y = doc.y;
      }
      values.forEach((v, i) => {
        doc
          .font(font)
          .fontSize(7.5)
          .fillColor('#000')
          .text(v, x + 2, y + 2, { width: header[i].w - 4 });
        x += header[i].w;
      });
      y += hgt;
      doc.moveTo(50, y).lineTo(x, y).lineWidth(0.4).strokeColor('#999').stroke();
    };
    line(
      header.map((c) => c.title),
      'bold',
    );
    body.forEach((b) => line(b, 'text'));
    doc.x = 50;
    doc.y = y + 6;
  };
  table(cols, rows.map(cells));
  p(
    'Seedbank cells: median, then the range 90 % of the runs fall in. Cost: median cumulative cost over the horizon. NPV: mean net present value of crop value less yield loss and cost, discounted at ' +
      `${fmt(first.discountRate * 100, 1)} % a year, minus that of doing nothing.`,
    8,
  );

  const letIt = input.runs.find((r) => r.role === 'let-it-seed');
  const plain =
    letIt &&
    input.runs.find(
      (r) => r.role === 'strategy' && r.snapshot.strategy.name === letIt.snapshot.strategy.name,
    );
  if (letIt && plain) {
    const pay = letItSeedPayoff(plain.summary, letIt.summary);
    h2(`What one year of letting it seed costs`);
    p(
      `If the seed-set steps of "${plain.label}" are skipped in year ${letIt.snapshot.letItSeedYear}, the seedbank holds on average ${fmt(u.density(pay.extraAtHorizon))} more ${u.densityUnit} after ${H} years, ` +
        `and the net present value falls by ${money(pay.npvCost)} over the ${H} years.`,
    );
  }

  h2('The strategies, year by year');
  for (const r of input.runs.filter((x) => x.role === 'strategy')) {
    doc.font('bold').fontSize(9.5).text(r.label);
    if (!r.snapshot.strategy.steps.length) p('No steps.');
    for (const step of r.snapshot.strategy.steps) p(`• ${describeStep(step, money)}`, 8.5);
    doc.moveDown(0.3);
  }

  h2('Assumptions and where they came from');
  const profile = first.profile;
  const sourceOf = (key: string) => input.profileSources[key.replace(/^profile\./, '')];
  const assumptions: string[] = [];
  const walk = (obj: unknown, path: string) => {
    if (typeof obj === 'number') {
      const meta = (
        parameterCatalogue as Record<string, { label: string; unit: string; defaultSource: string }>
      )[path];
      if (meta)
        assumptions.push(
          `${meta.label}: ${fmt(obj, 4)} ${meta.unit} — ${sourceOf(path) ?? meta.defaultSource}`,
        );
    } else if (obj && typeof obj === 'object' && !Array.isArray(obj)) {
      for (const [k, v] of Object.entries(obj)) walk(v, `${path}.${k}`);
    }
  };
  walk(profile, 'profile');
  p(assumptions.join('\n'), 7.5);

  h2('Reproducing these numbers');
  p(
    input.runs
      .map(
        (r) =>
          `${r.label}: seed ${r.seed}, ${r.snapshot.replicates} replicates, ${r.snapshot.horizonYears} years, efficacy drawn ${r.snapshot.efficacyDraw}.`,
      )
      .join('\n') +
      '\nThe same inputs and seed give the same numbers on any machine (Seedwake keeps every run’s input snapshot).',
    8,
  );

  if (input.runs.some((r) => hasChemicalStep(r.snapshot.strategy))) {
    h2('Pesticide cautions');
    p(pesticideCautions.map((c) => `• ${c}`).join('\n'), 9);
    p('Seedwake records active ingredients and rates only as you entered them; it never suggests a rate.', 8);
  }

  const pages = doc.bufferedPageRange();
  for (let i = 0; i < pages.count; i++) {
    doc.switchToPage(i);
    // The footer sits in the bottom margin; lift the margin so pdfkit does not start a new page.
    doc.page.margins.bottom = 0;
    doc
      .font('text')
      .fontSize(7)
      .fillColor('#555')
      .text(`Seedwake · ${input.scenarioName} · page ${i + 1} of ${pages.count}`, 50, doc.page.height - 40, {
        lineBreak: false,
      });
  }
  doc.end();
  return done;
}
