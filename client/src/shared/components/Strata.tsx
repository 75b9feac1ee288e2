import { useMemo } from 'react';

/*
 * Seedwake's motif: a soil profile cut open. Litter and humus on top, the loam of the
 * shallow seedbank below it, ochre clay holding the deep seedbank, pale parent material
 * at the bottom. Seeds are drawn densest near the surface, as a seedbank usually is, and
 * a few seedlings stand on the surface in the one living green. The layout is generated
 * from a fixed seed so the drawing is the same on every load and in every print.
 */

type Variant = 'panel' | 'band';

type Geometry = { width: number; height: number; surface: number; horizons: [number, number, number] };

// Depths as fractions of the drawing: surface, then the bottom of humus, loam and clay.
const geometries: Record<Variant, Geometry> = {
  panel: { width: 600, height: 440, surface: 0.12, horizons: [0.27, 0.6, 0.86] },
  band: { width: 1200, height: 220, surface: 0.2, horizons: [0.34, 0.64, 0.9] },
};

/** mulberry32: a tiny deterministic generator; quality is irrelevant for a drawing. */
function generator(seed: number): () => number {
  let state = seed >>> 0;
  return () => {
    state = (state + 0x6d2b79f5) >>> 0;
    let t = state;
    t = Math.imul(t ^ (t >>> 15), t | 1);
    t ^= t + Math.imul(t ^ (t >>> 7), t | 61);
    return ((t ^ (t >>> 14)) >>> 0) / 4294967296;
  };
}

/** A smooth wavy horizon boundary through evenly spaced points (Catmull-Rom as cubic Béziers). */
function boundary(
  width: number,
  y: number,
  amplitude: number,
  random: () => number,
): { path: string; at: (x: number) => number } {
  const steps = 8;
  const points = Array.from({ length: steps + 1 }, (_, i) => ({
    x: (width * i) / steps,
    y: y + (random() * 2 - 1) * amplitude,
  }));
  let path = `L0,${points[0].y.toFixed(1)}`;
  for (let i = 0; i < steps; i++) {
    const p0 = points[Math.max(0, i - 1)];
    const p1 = points[i];
    const p2 = points[i + 1];
    const p3 = points[Math.min(steps, i + 2)];
    const c1 = { x: p1.x + (p2.x - p0.x) / 6, y: p1.y + (p2.y - p0.y) / 6 };
    const c2 = { x: p2.x - (p3.x - p1.x) / 6, y: p2.y - (p3.y - p1.y) / 6 };
    path += ` C${c1.x.toFixed(1)},${c1.y.toFixed(1)} ${c2.x.toFixed(1)},${c2.y.toFixed(1)} ${p2.x.toFixed(1)},${p2.y.toFixed(1)}`;
  }
  // Linear interpolation between the control points is close enough to place seeds below the line.
  const at = (x: number) => {
    const i = Math.min(steps - 1, Math.floor((x / width) * steps));
    const f = (x - points[i].x) / (points[i + 1].x - points[i].x);
    return points[i].y + (points[i + 1].y - points[i].y) * f;
  };
  return { path, at };
}

type Seed = { x: number; y: number; rotate: number; scale: number };

function scatter(
  count: number,
  width: number,
  top: (x: number) => number,
  bottom: (x: number) => number,
  random: () => number,
): Seed[] {
  return Array.from({ length: count }, () => {
    const x = 12 + random() * (width - 24);
    const t = top(x) + 10;
    const b = bottom(x) - 10;
    return { x, y: t + random() * Math.max(0, b - t), rotate: random() * 180, scale: 0.7 + random() * 0.6 };
  });
}

function buildProfile(variant: Variant) {
  const g = geometries[variant];
  const random = generator(variant === 'panel' ? 20240917 : 1871);
  const h = g.height;
  const amplitude = variant === 'panel' ? 14 : 7;
  const surface = boundary(g.width, g.surface * h, amplitude * 0.4, random);
  const [humus, loam, clay] = g.horizons.map((f) => boundary(g.width, f * h, amplitude, random));
  const density = g.width / 600;
  const seeds = {
    // Fresh seed rain lies in the litter; most of the bank sits shallow; a few persist deep.
    litter: scatter(Math.round(5 * density), g.width, surface.at, humus.at, random),
    shallow: scatter(
      Math.round((variant === 'panel' ? 34 : 20) * density),
      g.width,
      humus.at,
      loam.at,
      random,
    ),
    deep: scatter(Math.round((variant === 'panel' ? 12 : 7) * density), g.width, loam.at, clay.at, random),
  };
  const stones = Array.from({ length: Math.round(6 * density) }, () => {
    const x = random() * g.width;
    const y = clay.at(x) + 8 + random() * Math.max(4, h - clay.at(x) - 8);
    return { x, y, rx: 6 + random() * 12, ry: 4 + random() * 6, rotate: random() * 40 - 20 };
  });
  const seedlingCount = variant === 'panel' ? 3 : 5;
  const seedlings = Array.from({ length: seedlingCount }, (_, i) => {
    const x = g.width * ((i + 0.5 + (random() - 0.5) * 0.6) / seedlingCount);
    return { x, y: surface.at(x), height: 16 + random() * 12, lean: (random() - 0.5) * 8 };
  });
  const layer = (line: { path: string }) => `M0,${h} ${line.path} L${g.width},${h} Z`;
  return {
    g,
    // Each layer is painted from its top boundary to the bottom; the next one covers it from its own top.
    layers: { humus: layer(surface), loam: layer(humus), clay: layer(loam), parent: layer(clay) },
    seeds,
    stones,
    seedlings,
    labelY: { shallow: (humus.at(24) + loam.at(24)) / 2, deep: (loam.at(24) + clay.at(24)) / 2 },
  };
}

/** Coat and rim come as fill-/stroke- classes, chosen per layer so seeds stay visible on each. */
function SeedMark({ seed, coat, rim }: { seed: Seed; coat: string; rim: string }) {
  return (
    <g
      transform={`translate(${seed.x.toFixed(1)} ${seed.y.toFixed(1)}) rotate(${seed.rotate.toFixed(0)}) scale(${seed.scale.toFixed(2)})`}
    >
      <ellipse rx="6" ry="3.6" className={`${coat} ${rim}`} strokeWidth="1" />
      <path d="M-3.5,0 Q0,-1.6 3.5,0" className={`fill-none ${rim}`} strokeOpacity="0.7" strokeWidth="0.8" />
    </g>
  );
}

type StrataProps = {
  variant?: Variant;
  /** Name the shallow and deep seedbank layers on the drawing. */
  labelled?: boolean;
  className?: string;
};

/** Decorative: hidden from assistive technology; the page text says what matters. */
export function Strata({ variant = 'panel', labelled = false, className = '' }: StrataProps) {
  const profile = useMemo(() => buildProfile(variant), [variant]);
  const { g, layers, seeds, stones, seedlings, labelY } = profile;
  // Keep the label text clear of seeds so it stays legible.
  const clearOfLabels = (seed: Seed) =>
    !labelled ||
    seed.x > 230 ||
    (Math.abs(seed.y - labelY.shallow) > 14 && Math.abs(seed.y - labelY.deep) > 14);
  return (
    <svg
      viewBox={`0 0 ${g.width} ${g.height}`}
      preserveAspectRatio="xMinYMin slice"
      className={className}
      aria-hidden="true"
      focusable="false"
    >
      <path d={layers.humus} className="fill-humus-800" />
      <path d={layers.loam} className="fill-loam-600" />
      <path d={layers.clay} className="fill-clay-500" />
      <path d={layers.parent} className="fill-silt-300" />
      {stones.map((s, i) => (
        <ellipse
          key={i}
          cx={s.x}
          cy={s.y}
          rx={s.rx}
          ry={s.ry}
          transform={`rotate(${s.rotate.toFixed(0)} ${s.x.toFixed(1)} ${s.y.toFixed(1)})`}
          className="fill-silt-400 stroke-loam-400"
        />
      ))}
      {seeds.litter.filter(clearOfLabels).map((s, i) => (
        <SeedMark key={`l${i}`} seed={s} coat="fill-russet-500" rim="stroke-clay-300" />
      ))}
      {seeds.shallow.filter(clearOfLabels).map((s, i) => (
        <SeedMark key={`s${i}`} seed={s} coat="fill-russet-600" rim="stroke-russet-200" />
      ))}
      {seeds.deep.filter(clearOfLabels).map((s, i) => (
        <SeedMark key={`d${i}`} seed={s} coat="fill-russet-700" rim="stroke-clay-100" />
      ))}
      {seedlings.map((p, i) => (
        <g key={i} transform={`translate(${p.x.toFixed(1)} ${(p.y + 2).toFixed(1)})`}>
          <path
            d={`M0,0 Q${(p.lean / 2).toFixed(1)},${(-p.height / 2).toFixed(1)} ${p.lean.toFixed(1)},${(-p.height).toFixed(1)}`}
            className="fill-none stroke-sprout-500"
            strokeWidth="3"
            strokeLinecap="round"
          />
          <path d={`M${p.lean},${-p.height} q-5,-9 -14,-6 q4,8 14,6 z`} className="fill-sprout-500" />
          <path d={`M${p.lean},${-p.height} q5,-9 14,-6 q-4,8 -14,6 z`} className="fill-sprout-600" />
        </g>
      ))}
      {labelled ? (
        <g fontFamily="'IBM Plex Sans', sans-serif" fontSize="13" fontWeight="600" letterSpacing="0.08em">
          <text x="24" y={labelY.shallow} dominantBaseline="middle" className="fill-silt-50">
            SHALLOW SEEDBANK
          </text>
          <text x="24" y={labelY.deep} dominantBaseline="middle" className="fill-humus-900">
            DEEP SEEDBANK
          </text>
        </g>
      ) : null}
    </svg>
  );
}
