import { useId } from 'react';
import { parameterCatalogue, rangeText } from '../../../../shared/scenario/parameters';
import type { Slider, SliderSpec } from '../../../../shared/lessons/templates';
import { conversion, formatNumber, shownParameter } from '../../shared/lib/parameterDraft';
import { useUnits } from '../../shared/lib/units';

type LessonSliderProps = {
  spec: SliderSpec;
  /** The range and step the teacher fixed. */
  slider: Slider;
  value: number;
  onChange: (value: number) => void;
  large?: boolean;
};

/**
 * One lesson slider: a native range input, so arrow keys, Page Up/Down and Home/End move
 * it and screen readers announce its value with the unit. Under it, what it means, its
 * range here, the parameter's valid range and where its default comes from.
 */
export function LessonSlider({ spec, slider, value, onChange, large = false }: LessonSliderProps) {
  const id = useId();
  const { system } = useUnits();
  const p = parameterCatalogue[spec.parameter];
  const c = conversion(p.unit, system);
  // A year reads as "year 3", every other value as number and unit.
  const shown = (v: number) =>
    c.unit === 'year' ? `year ${v}` : `${formatNumber(c.toShown(v), 3)} ${c.unit}`;
  const source = p.defaultSource === 'illustrative' ? 'illustrative' : p.defaultSource;
  return (
    <div className={`flex flex-col ${large ? 'gap-2' : 'gap-1.5'}`}>
      <div className="flex flex-wrap items-baseline justify-between gap-x-4">
        <label htmlFor={id} className={`font-medium text-humus-900 ${large ? 'text-2xl' : ''}`}>
          {spec.label}
        </label>
        <output
          htmlFor={id}
          className={`font-semibold text-humus-900 tabular-nums ${large ? 'text-3xl' : 'text-lg'}`}
        >
          {shown(value)}
        </output>
      </div>
      <input
        id={id}
        type="range"
        min={slider.min}
        max={slider.max}
        step={slider.step}
        value={value}
        onChange={(event) => onChange(Number(event.target.value))}
        aria-describedby={`${id}-meaning`}
        aria-valuetext={shown(value)}
        className={`w-full cursor-pointer accent-russet-700 ${large ? 'h-10' : 'h-6'}`}
      />
      <div
        className={`flex justify-between text-loam-700 tabular-nums ${large ? 'text-lg' : 'text-xs'}`}
        aria-hidden="true"
      >
        <span>{shown(slider.min)}</span>
        <span>{shown(slider.max)}</span>
      </div>
      <p id={`${id}-meaning`} className={`text-loam-700 ${large ? 'sr-only' : 'text-sm'}`}>
        {spec.meaning} Valid {rangeText(shownParameter(p, system))}; the catalogue’s default{' '}
        {p.default === null ? 'is none' : `is ${formatNumber(c.toShown(p.default), 4)}`} ({source}).
      </p>
    </div>
  );
}
