import { useId } from 'react';

type ChartOptionProps<T extends string> = {
  /** Read out as the group's name, e.g. "Scale of the seedbank chart". */
  legend: string;
  /** Shown before the choices; hidden when the legend alone would repeat it. */
  label: string;
  value: T;
  options: readonly { value: T; label: string }[];
  onChange: (value: T) => void;
};

/**
 * A small choice drawn beside a chart (linear or log scale, which bands to shade), as
 * radio buttons: arrow keys move between them and a screen reader names the group.
 */
export function ChartOption<T extends string>({
  legend,
  label,
  value,
  options,
  onChange,
}: ChartOptionProps<T>) {
  const name = useId();
  return (
    <fieldset className="flex items-center gap-1.5">
      <legend className="sr-only">{legend}</legend>
      <span className="text-xs text-loam-700" aria-hidden="true">
        {label}
      </span>
      <div className="flex rounded-seed border border-silt-300 bg-silt-50 p-0.5">
        {options.map((option) => (
          <label
            key={option.value}
            className="cursor-pointer rounded-[0.25rem] px-2 py-1 text-xs font-medium text-loam-700 has-checked:bg-humus-900 has-checked:text-silt-50 has-focus-visible:outline-3 has-focus-visible:outline-offset-2 has-focus-visible:outline-clay-600"
          >
            <input
              type="radio"
              name={name}
              value={option.value}
              checked={value === option.value}
              onChange={() => onChange(option.value)}
              className="sr-only"
            />
            {option.label}
          </label>
        ))}
      </div>
    </fieldset>
  );
}
