import type { ReactElement } from 'react';
import type { StepKind } from '../../../../models/scenario/types';
import { kindInfo, type StepFamily } from './stepKinds';

/*
 * Seedwake's own marks for the step kinds, drawn on a 24-unit grid around one soil line
 * (y = 16): what the step does to a seed or a plant, read at a glance. Seeds are russet,
 * plants the living green, tools and herbicide humus and ochre. Decorative: the step's
 * name is always written beside a glyph.
 */

const soil = <path d="M2 16.5h20" className="stroke-loam-500" strokeWidth="1.5" strokeLinecap="round" />;
const seed = (x: number, y: number, r = 0) => (
  <ellipse cx={x} cy={y} rx="2.1" ry="1.4" transform={`rotate(${r} ${x} ${y})`} className="fill-russet-600" />
);
const sprout = (x: number, base: number, height: number) => (
  <g>
    <path
      d={`M${x} ${base}v-${height}`}
      className="stroke-sprout-700"
      strokeWidth="1.6"
      strokeLinecap="round"
    />
    <path d={`M${x} ${base - height}q-4.2-2.6-6-0.4q2.4 3 6 0.4z`} className="fill-sprout-600" />
    <path d={`M${x} ${base - height}q4.2-2.6 6-0.4q-2.4 3-6 0.4z`} className="fill-sprout-500" />
  </g>
);
const drop = (x: number, y: number) => (
  <path d={`M${x} ${y - 3.6}q2.6 3.2 2.6 4.9a2.6 2.6 0 0 1-5.2 0q0-1.7 2.6-4.9z`} className="fill-clay-600" />
);

const glyphs: Record<StepKind, ReactElement> = {
  'pre-emergence-herbicide': (
    <>
      {soil}
      {drop(12, 7)}
      <path d="M5 14.2h14" className="stroke-clay-500" strokeWidth="1.2" strokeDasharray="1.5 1.5" />
      {seed(12, 19.5)}
    </>
  ),
  'post-emergence-herbicide': (
    <>
      {soil}
      {sprout(10, 16.5, 6)}
      {drop(18, 6.5)}
    </>
  ),
  'spot-treatment': (
    <>
      {soil}
      {sprout(12, 16.5, 5.5)}
      <circle
        cx="12"
        cy="11.5"
        r="8"
        fill="none"
        className="stroke-clay-600"
        strokeWidth="1.3"
        strokeDasharray="2 1.6"
      />
      {drop(19.5, 5)}
    </>
  ),
  mowing: (
    <>
      {soil}
      <path d="M12 16.5v-5" className="stroke-sprout-700" strokeWidth="1.6" strokeLinecap="round" />
      <path
        d="M13.2 8.2l-1.2-3.2"
        className="stroke-sprout-600"
        strokeWidth="1.6"
        strokeLinecap="round"
        opacity="0.55"
      />
      <path d="M4 10.5h16" className="stroke-humus-900" strokeWidth="1.8" strokeLinecap="round" />
    </>
  ),
  'hand-removal-with-crown': (
    <>
      {soil}
      {sprout(12, 11, 4)}
      <path
        d="M12 11v4.5m0-2l-2 2m2-1.2l2 2"
        className="stroke-loam-700"
        strokeWidth="1.3"
        strokeLinecap="round"
      />
      <path
        d="M5 8l2.5-3 2.5 3"
        fill="none"
        className="stroke-humus-900"
        strokeWidth="1.5"
        strokeLinecap="round"
        strokeLinejoin="round"
      />
      <path d="M12 20h0" className="stroke-loam-500" strokeWidth="2.4" strokeLinecap="round" opacity="0.4" />
    </>
  ),
  'hand-removal-leaving-crown': (
    <>
      {soil}
      {sprout(12, 10, 4)}
      <circle cx="12" cy="18.6" r="1.9" className="fill-loam-700" />
      <path d="M12 20.4v2" className="stroke-loam-700" strokeWidth="1.3" strokeLinecap="round" />
      <path
        d="M5 8l2.5-3 2.5 3"
        fill="none"
        className="stroke-humus-900"
        strokeWidth="1.5"
        strokeLinecap="round"
        strokeLinejoin="round"
      />
    </>
  ),
  cultivation: (
    <>
      <path d="M2 16.5q2.5-2.5 5 0t5 0t5 0t5 0" fill="none" className="stroke-loam-500" strokeWidth="1.5" />
      <path
        d="M8 4v13.5M16 4v13.5M6 4h12"
        fill="none"
        className="stroke-humus-900"
        strokeWidth="1.6"
        strokeLinecap="round"
      />
      {seed(12, 20, 30)}
      {seed(19.5, 21, -20)}
    </>
  ),
  mulch: (
    <>
      {soil}
      <path
        d="M3 13.5h18M4 10.8h16M6 8.1h12"
        className="stroke-loam-700"
        strokeWidth="1.8"
        strokeLinecap="round"
      />
      {seed(12, 20)}
    </>
  ),
  'seed-set-prevention': (
    <>
      {soil}
      <path d="M12 16.5v-7" className="stroke-sprout-700" strokeWidth="1.6" strokeLinecap="round" />
      {seed(10, 7.5, -40)}
      {seed(14, 7.5, 40)}
      {seed(12, 4.8, 90)}
      <path d="M6 3l12 9" className="stroke-humus-900" strokeWidth="1.8" strokeLinecap="round" />
    </>
  ),
  'crop-competition': (
    <>
      {soil}
      <path d="M17 16.5V4" className="stroke-sprout-800" strokeWidth="1.8" strokeLinecap="round" />
      <path d="M17 5q-7 0-10 5q6 1 10-3z" className="fill-sprout-700" />
      {sprout(8, 16.5, 2.5)}
    </>
  ),
};

export const familySurface: Record<StepFamily, string> = {
  chemical: 'bg-clay-100 border-clay-500',
  'hands-and-machines': 'bg-white border-loam-500',
  seed: 'bg-russet-100 border-russet-500',
  cover: 'bg-sprout-100 border-sprout-600',
};

export function StepGlyph({ kind, className = 'size-6' }: { kind: StepKind; className?: string }) {
  return (
    <svg viewBox="0 0 24 24" className={className} aria-hidden="true" focusable="false">
      {glyphs[kind]}
    </svg>
  );
}

/** The glyph on its family's seed-shaped tile, as placed on the timeline. */
export function StepTile({ kind, className = '' }: { kind: StepKind; className?: string }) {
  return (
    <span
      className={`inline-flex size-8 shrink-0 items-center justify-center rounded-[45%_55%_50%_50%] border ${familySurface[kindInfo[kind].family]} ${className}`}
      aria-hidden="true"
    >
      <StepGlyph kind={kind} />
    </span>
  );
}
