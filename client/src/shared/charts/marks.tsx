import {
  symbol,
  symbolCircle,
  symbolCross,
  symbolDiamond,
  symbolSquare,
  symbolStar,
  symbolTriangle,
  type SymbolType,
} from 'd3-shape';
import type { MarkerKind, SeriesStyle } from './palette';

const shapes: Record<Exclude<MarkerKind, 'none' | 'ring'>, SymbolType> = {
  circle: symbolCircle,
  square: symbolSquare,
  triangle: symbolTriangle,
  diamond: symbolDiamond,
  cross: symbolCross,
  star: symbolStar,
};

/** One point marker centred on (x, y). Ring markers are open, so No control reads as a reference. */
export function Marker({
  style,
  x,
  y,
  size = 42,
}: {
  style: SeriesStyle;
  x: number;
  y: number;
  size?: number;
}) {
  if (style.marker === 'none') return null;
  if (style.marker === 'ring') {
    return <circle cx={x} cy={y} r={3.6} fill="#ffffff" stroke={style.color} strokeWidth={1.6} />;
  }
  const d = symbol(shapes[style.marker], size)() ?? '';
  return (
    <path
      d={d}
      transform={`translate(${x.toFixed(1)} ${y.toFixed(1)})`}
      fill={style.color}
      stroke="#ffffff"
      strokeWidth={0.8}
    />
  );
}

/** A short sample of the line and its marker, for legends inside and outside charts. */
export function LineSwatch({
  style,
  x = 0,
  y = 0,
  width = 30,
}: {
  style: SeriesStyle;
  x?: number;
  y?: number;
  width?: number;
}) {
  return (
    <g transform={`translate(${x} ${y})`}>
      <line
        x1={0}
        x2={width}
        y1={0}
        y2={0}
        stroke={style.color}
        strokeWidth={style.width}
        strokeDasharray={style.dash ?? undefined}
        strokeLinecap={style.dash === '1 4' || style.dash === '2 3' ? 'round' : 'butt'}
      />
      <Marker style={style} x={width / 2} y={0} />
    </g>
  );
}

/** The swatch as a small stand-alone image for HTML legends and table rows. */
export function StyleSwatch({ style, className = '' }: { style: SeriesStyle; className?: string }) {
  return (
    <svg
      width={34}
      height={12}
      viewBox="-2 -6 34 12"
      className={`inline-block shrink-0 ${className}`}
      aria-hidden="true"
    >
      <LineSwatch style={style} />
    </svg>
  );
}
