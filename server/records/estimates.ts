// The field's estimates from its stored uploads, through the estimators in models/records.
// Soil cores and plant counts are pooled over the field's uploads (they are time series:
// several samplings make the decay and transition estimates); a germination test and an
// efficacy trial are each one experiment and are analysed per upload.
import tQuantile from '@stdlib/stats-base-dists-t-quantile';
import { analyseEfficacy, type EfficacyPlot } from '../../models/records/efficacy';
import { estimateSeedDecay } from '../../models/records/decay';
import { analyseGermination, type GerminationRecord } from '../../models/records/germination';
import type { PlantCount } from '../../models/records/plant-counts';
import { estimateStageDensities } from '../../models/records/plant-density';
import { RecordsError, type RecordIssue } from '../../models/records/records-error';
import { estimateSeedbankDensity, type SoilCoreSample } from '../../models/records/seedbank-density';
import { estimateTransition, type TransitionSpec } from '../../models/records/transitions';
import type { Adoptable, FieldEstimates, RecordProblem, SourceRef } from '../../shared/api/records';
import type { RecordKind } from '../../shared/records/columns';
import { num } from '../../shared/records/adopt-notes';
import { ci, pct, plusMinus, range, sourceNote } from './notes';
import type { TypedRow } from './typed-rows';

export interface StoredUpload {
  id: string;
  filename: string;
  sha256: string;
  kind: RecordKind;
  check: string | null;
  /** Tags of the header forms used (seedbank: count → seeds-counted | seedlings-emerged). */
  tags: Record<string, string>;
  rows: TypedRow[];
}

/** A problem an estimator found, placed on the upload and line it came from. */
export interface PlacedIssue {
  uploadId: string | null;
  line: number | null;
  message: string;
}

interface Origin {
  upload: StoredUpload;
  line: number;
}

const ref = (u: StoredUpload): SourceRef => ({ uploadId: u.id, filename: u.filename, sha256: u.sha256 });

/** Runs an estimator; a RecordsError becomes issues placed through `origins`, anything else is a bug and is rethrown. */
function attempt<T>(run: () => T, origins: readonly Origin[], issues: PlacedIssue[]): T | null {
  try {
    return run();
  } catch (error) {
    if (!(error instanceof RecordsError)) throw error;
    for (const issue of error.issues) issues.push(place(issue, origins));
    return null;
  }
}

function place(issue: RecordIssue, origins: readonly Origin[]): PlacedIssue {
  const at = issue.index === null ? undefined : origins[issue.index];
  return { uploadId: at?.upload.id ?? null, line: at?.line ?? null, message: issue.message };
}

const messages = (issues: readonly PlacedIssue[]) =>
  issues.length ? issues.map((i) => i.message).join('; ') : null;

function adoptable(
  init: Omit<Adoptable, 'fraction' | 'efficacy' | 'layers' | 'ok' | 'reason'> & Partial<Adoptable>,
): Adoptable {
  return { fraction: null, efficacy: null, layers: null, ok: true, reason: null, ...init };
}

const key = (...parts: (string | number)[]) => JSON.stringify(parts);

/** Years in a row from the date column (YYYY-MM-DD). */
const yearOf = (row: TypedRow) => Number(String(row.values.date).slice(0, 4));

function seedbank(
  uploads: readonly StoredUpload[],
  recordsPath: string,
  issues: PlacedIssue[],
): FieldEstimates['seedbank'] {
  const entries = uploads.flatMap((upload) => upload.rows.map((row) => ({ upload, row })));
  const years = [...new Set(entries.map((e) => yearOf(e.row)))].sort((a, b) => a - b);
  const own: PlacedIssue[] = [];
  const out: FieldEstimates['seedbank']['years'] = [];
  for (const year of years) {
    const here = entries.filter((e) => yearOf(e.row) === year);
    const origins = here.map((e) => ({ upload: e.upload, line: e.row.line }));
    const samples: SoilCoreSample[] = here.map(({ row }) => ({
      layer: row.values.layer as string,
      coreDiameterCm: row.values.coreDiameterCm as number,
      cores: row.values.cores as number,
      count: row.values.count as number,
    }));
    const layers = attempt(() => estimateSeedbankDensity(samples), origins, own);
    if (!layers) continue;
    const contributing = [...new Set(here.map((e) => e.upload))];
    const methods = [...new Set(contributing.map((u) => u.tags.count ?? 'seeds-counted'))];
    const sources = contributing.map(ref);
    const method = (methods.length === 1 ? methods[0] : 'mixed') as
      'seeds-counted' | 'seedlings-emerged' | 'mixed';
    const described = layers
      .map(
        (l) =>
          `${l.layer} ${num(l.perM2.estimate)} seeds/m² (${ci(l.perM2.confidence)} ${l.method === 'exact-poisson' ? 'exact Poisson' : 'negative-binomial'} interval ${range(num(l.perM2.lower), num(l.perM2.upper))}, ${l.cores} cores)`,
      )
      .join('; ');
    out.push({
      year,
      method,
      layers: layers.map((l) => ({
        layer: l.layer,
        cores: l.cores,
        samples: l.samples,
        count: l.count,
        areaM2: l.areaM2,
        perM2: l.perM2,
        perFt2: l.perFt2,
        method: l.method,
        reason: l.reason,
        k: l.k,
      })),
      sources,
      adopt: adoptable({
        key: key('seedbank', year),
        label: `Seedbank from the ${year} cores`,
        target: 'field-seedbank',
        parameters: [],
        layers: layers.map((l) => ({ layer: l.layer, seedsPerM2: l.perM2.estimate })),
        note: sourceNote(
          sources,
          `${year} soil cores (${method.replace('-', ' ')}): ${described}`,
          recordsPath,
        ),
        sources,
      }),
    });
  }
  issues.push(...own);

  // Seed decay per layer from the yearly densities: the series' net loss rate.
  const layerNames = [...new Set(out.flatMap((y) => y.layers.map((l) => l.layer)))];
  const decay = layerNames.map((layer, position) => {
    const points = out.flatMap((y) => {
      const l = y.layers.find((x) => x.layer === layer);
      return l ? [{ year: y.year, seedsPerM2: l.perM2.estimate, sources: y.sources }] : [];
    });
    const observations = points.map(({ year, seedsPerM2 }) => ({ year, seedsPerM2 }));
    const fitIssues: PlacedIssue[] = [];
    const result = attempt(() => estimateSeedDecay(observations), [], fitIssues);
    const sources = [...new Map(points.flatMap((p) => p.sources).map((s) => [s.uploadId, s])).values()];
    if (!result) {
      return { layer, observations, result: null, problem: messages(fitIssues), adopt: null };
    }
    const d = result.decayRate;
    const span = `${points[0].year}–${points[points.length - 1].year}`;
    const ok = d.estimate >= 0 && d.estimate <= 1;
    return {
      layer,
      observations,
      result: {
        df: result.df,
        slope: result.slope,
        slopeStandardError: result.slopeStandardError,
        intercept: result.intercept,
        rSquared: result.rSquared,
        annualSurvival: result.annualSurvival,
        decayRate: d,
        halfLifeYears: result.halfLifeYears,
      },
      problem: null,
      adopt: adoptable({
        key: key('decay', layer),
        label: `Seed decay in ${layer}, ${span}`,
        target: 'profile',
        parameters:
          position === 0 ? ['seedDecay.shallow', 'seedDecay.deep'] : ['seedDecay.deep', 'seedDecay.shallow'],
        fraction: d.estimate,
        ok,
        reason: ok ? null : 'the seedbank grew over the series, so the fit gives no decay rate',
        note: sourceNote(
          sources,
          `seedbank ${layer}: net loss ${pct(100 * d.estimate)} % per year (${ci(d.confidence)} interval ${range(pct(100 * d.lower), pct(100 * d.upper))} %), log-linear fit of ${observations.length} yearly densities ${span}; it includes germination and seed rain, not decay alone`,
          recordsPath,
        ),
        sources,
      }),
    };
  });
  return { years: out, decay, problem: messages(own) };
}

const transitionSpecs: {
  key: 'survival' | 'flowering';
  label: string;
  definition: string;
  parameter: string;
  spec: TransitionSpec;
}[] = [
  {
    key: 'survival',
    label: 'Survival of established plants',
    definition:
      'rosette + flowering plants in a quadrat one year later, out of rosette + flowering plants this year (the same plants followed: tagged or a closed cohort)',
    parameter: 'overWinterSurvival',
    spec: { from: ['rosette', 'flowering'], to: ['rosette', 'flowering'], yearLag: 1 },
  },
  {
    key: 'flowering',
    label: 'Flowering fraction',
    definition: 'flowering plants out of rosette + flowering plants in the same quadrat and year',
    parameter: 'floweringProbability',
    spec: { from: ['rosette', 'flowering'], to: ['flowering'], yearLag: 0 },
  },
];

function plants(
  uploads: readonly StoredUpload[],
  recordsPath: string,
  issues: PlacedIssue[],
): FieldEstimates['plants'] {
  const entries = uploads.flatMap((upload) => upload.rows.map((row) => ({ upload, row })));
  const origins = entries.map((e) => ({ upload: e.upload, line: e.row.line }));
  const counts: PlantCount[] = entries.map(({ row }) => ({
    quadrat: row.values.quadrat as string,
    year: row.values.year as number,
    stage: row.values.stage as string,
    count: row.values.count as number,
    quadratAreaM2: row.values.quadratAreaM2 as number,
  }));
  const sources = uploads.map(ref);
  if (counts.length === 0) return { densities: [], transitions: [], problem: null, sources };
  const own: PlacedIssue[] = [];
  const densities = attempt(() => estimateStageDensities(counts), origins, own);
  issues.push(...own);
  if (!densities) return { densities: [], transitions: [], problem: messages(own), sources };
  const transitions = transitionSpecs.map((t) => {
    const found: PlacedIssue[] = [];
    const result = attempt(() => estimateTransition(counts, t.spec), origins, found);
    if (!result) {
      return {
        key: t.key,
        label: t.label,
        definition: t.definition,
        pooled: null,
        byYear: [],
        problem: messages(found),
        adopt: null,
      };
    }
    const p = result.pooled;
    const years = result.byYear.map((y) => y.year);
    const span = years.length > 1 ? `${years[0]}–${years[years.length - 1]}` : String(years[0]);
    return {
      key: t.key,
      label: t.label,
      definition: t.definition,
      pooled: p,
      byYear: result.byYear,
      problem: null,
      adopt: adoptable({
        key: key('transition', t.key),
        label: `${t.label}, ${span}`,
        target: 'profile',
        parameters: [t.parameter],
        fraction: p.estimate,
        note: sourceNote(
          sources,
          `${t.label.toLowerCase()} ${num(p.estimate)} (${p.successes} of ${p.trials} plants, ${ci(p.confidence)} Wilson interval ${range(num(p.lower), num(p.upper))}), quadrat counts ${span}`,
          recordsPath,
        ),
        sources,
      }),
    };
  });
  return {
    densities: densities.map((d) => ({
      year: d.year,
      stage: d.stage,
      samples: d.samples,
      count: d.count,
      areaM2: d.areaM2,
      perM2: d.perM2,
      perFt2: d.perFt2,
      method: d.method,
      reason: d.reason,
      k: d.k,
    })),
    transitions,
    problem: null,
    sources,
  };
}

/** NIST SP 811, Appendix B: t/°F = 1.8·t/°C + 32. */
const celsiusToFahrenheit = (c: number) => (c * 9) / 5 + 32;

function temperatureText(c: number): string {
  return `${num(c)} °C (${num(celsiusToFahrenheit(c))} °F)`;
}

function germination(
  upload: StoredUpload,
  recordsPath: string,
  issues: PlacedIssue[],
): FieldEstimates['germination'][number] {
  const origins = upload.rows.map((row) => ({ upload, line: row.line }));
  const records: GerminationRecord[] = upload.rows.map(({ values }) => ({
    testId: values.testId as string,
    temperatureC: values.temperatureC as number,
    seeds: values.seeds as number,
    day: values.day as number,
    cumulativeGerminated: values.germinated as number,
  }));
  const own: PlacedIssue[] = [];
  const analysis = attempt(() => analyseGermination(records), origins, own);
  issues.push(...own);
  const source = ref(upload);
  if (!analysis) return { upload: source, tests: [], temperatures: [], best: null, problem: messages(own) };
  const tested = analysis.temperatures.map((t) => num(t.temperatureC)).join(', ');
  const byDish = new Map<string, GerminationRecord[]>();
  for (const r of records) {
    const list = byDish.get(r.testId.trim());
    if (list) list.push(r);
    else byDish.set(r.testId.trim(), [r]);
  }
  return {
    upload: source,
    tests: analysis.tests.map((t) => {
      const counts = (byDish.get(t.testId) ?? [])
        .sort((a, b) => a.day - b.day)
        .map((r) => ({ day: r.day, fraction: r.cumulativeGerminated / r.seeds }));
      return {
        testId: t.testId,
        temperatureC: t.temperatureC,
        seeds: t.seeds,
        fraction: t.fraction,
        t50Days: t.t50Days,
        curve: counts[0]?.day > 0 ? [{ day: 0, fraction: 0 }, ...counts] : counts,
      };
    }),
    temperatures: analysis.temperatures.map((t) => {
      const f = t.fraction;
      const best = analysis.best?.temperatureC === t.temperatureC;
      const t50 = t.t50Days
        ? `; mean T50 ${num(t.t50Days.meanDays)} days over ${t.t50Days.dishes} dishes`
        : '';
      return {
        ...t,
        adopt: adoptable({
          key: key('germination', upload.id, t.temperatureC),
          label: `Final germination at ${temperatureText(t.temperatureC)}`,
          target: 'profile',
          parameters: ['germination.shallowByAge[0]', 'germination.deep'],
          fraction: f.estimate,
          note: sourceNote(
            [source],
            `final germination ${num(f.estimate)} (${f.successes} of ${f.trials} seeds, ${ci(f.confidence)} Wilson interval ${range(num(f.lower), num(f.upper))}) at ${temperatureText(t.temperatureC)}${best ? ', the best' : ''} of ${tested} °C tested${t50}; a dish test measures germinability, not field emergence`,
            recordsPath,
          ),
          sources: [source],
        }),
      };
    }),
    best: analysis.best,
    problem: null,
  };
}

/** Mean ± t(1 − α/2; r − 1)·SD/√r: where the mean per-block % control lies, given the block-to-block spread. */
function meanInterval(mean: number, sd: number, r: number, confidence = 0.95) {
  const half = tQuantile(1 - (1 - confidence) / 2, r - 1) * (sd / Math.sqrt(r));
  return { estimate: mean, lower: mean - half, upper: mean + half, confidence };
}

function efficacy(
  upload: StoredUpload,
  recordsPath: string,
  issues: PlacedIssue[],
): FieldEstimates['efficacy'] {
  const source = ref(upload);
  const check = upload.check ?? '';
  const trials = [...new Set(upload.rows.map((r) => r.values.trial as string))];
  return trials.map((trial) => {
    const rows = upload.rows.filter((r) => r.values.trial === trial);
    const origins = rows.map((row) => ({ upload, line: row.line }));
    const plots: EfficacyPlot[] = rows.map(({ values }) => ({
      treatment: values.treatment as string,
      block: values.block as string,
      timing: values.timing as string,
      response: values.response as number,
    }));
    const own: PlacedIssue[] = [];
    const analyses = check === '' ? null : attempt(() => analyseEfficacy(plots, { check }), origins, own);
    if (check === '')
      own.push({
        uploadId: upload.id,
        line: null,
        message: 'Name the untreated check (as in the treatment column) in the upload form',
      });
    issues.push(
      ...own.map((i) => (trials.length > 1 ? { ...i, message: `trial ${trial}: ${i.message}` } : i)),
    );
    const base = {
      upload: source,
      trial,
      check,
      responseNote: 'weed biomass or plant count per plot, as in the file',
    };
    if (!analyses) return { ...base, timings: [], problem: messages(own) };
    return {
      ...base,
      timings: analyses.map((a) => ({
        timing: a.timing,
        checkMean: a.checkMean,
        anova: a.anova,
        lsd: a.lsd,
        treatments: a.treatments.map((t) => {
          const r = t.perBlock.length;
          const at = a.timing === null ? '' : ` at ${a.timing}`;
          return {
            treatment: t.treatment,
            meanResponse: t.meanResponse,
            percentControl: t.percentControl,
            perBlock: t.perBlock,
            meanPercentControl: t.meanPercentControl,
            sdPercentControl: t.sdPercentControl,
            interval: meanInterval(t.meanPercentControl, t.sdPercentControl, r),
            adopt: adoptable({
              key: key('efficacy', upload.id, trial, a.timing ?? '', t.treatment),
              label: `${t.treatment}${at}`,
              target: 'step',
              parameters: [],
              efficacy: t.efficacy,
              ok: t.adoptable,
              reason: t.adoptable ? null : t.adoptNote,
              note: sourceNote(
                [source],
                `trial ${trial}, ${t.treatment}: % control ${plusMinus(t.meanPercentControl, t.sdPercentControl)} % (mean ± SD over ${r} blocks against the untreated check)${at}`,
                recordsPath,
              ),
              sources: [source],
            }),
          };
        }),
      })),
      problem: null,
    };
  });
}

/**
 * Every estimate of a field from its uploads. Problems the estimators find go to `issues`
 * with the upload and line they come from, so a preview can put them on the file's rows.
 */
export function fieldEstimates(
  fieldId: string,
  uploads: readonly StoredUpload[],
  recordsPath: string,
): { estimates: FieldEstimates; issues: PlacedIssue[] } {
  const issues: PlacedIssue[] = [];
  const of = (kind: RecordKind) => uploads.filter((u) => u.kind === kind);
  const estimates: FieldEstimates = {
    fieldId,
    seedbank: seedbank(of('seedbank-samples'), recordsPath, issues),
    plants: plants(of('plant-counts'), recordsPath, issues),
    germination: of('germination-tests').map((u) => germination(u, recordsPath, issues)),
    efficacy: of('efficacy-trials').flatMap((u) => efficacy(u, recordsPath, issues)),
  };
  return { estimates, issues };
}

/** The estimators' problems that concern `upload`, as row-level problems of its file. */
export function problemsFor(
  upload: StoredUpload,
  issues: readonly PlacedIssue[],
  others: readonly StoredUpload[],
): RecordProblem[] {
  return issues.map((i) => {
    if (i.uploadId === upload.id || i.uploadId === null)
      return { line: i.line, column: null, message: i.message };
    const other = others.find((o) => o.id === i.uploadId);
    return {
      line: null,
      column: null,
      message: `together with the earlier upload ${other?.filename ?? ''} (its line ${i.line ?? '–'}): ${i.message}`,
    };
  });
}
