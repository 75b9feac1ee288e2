import { useId, type ChangeEvent } from 'react';

type SelectFieldProps = {
  label: string;
  name: string;
  value: string;
  onChange: (event: ChangeEvent<HTMLSelectElement>) => void;
  options: ReadonlyArray<{ value: string; label: string }>;
  hint?: string;
  error?: string;
  /** Keep the label for screen readers only, where a table column already names the field. */
  hideLabel?: boolean;
  size?: 'md' | 'sm';
};

export function SelectField({
  label,
  name,
  value,
  onChange,
  options,
  hint,
  error,
  hideLabel = false,
  size = 'md',
}: SelectFieldProps) {
  const id = useId();
  const hintId = `${id}-hint`;
  const errorId = `${id}-error`;
  const describedBy = [hint ? hintId : '', error ? errorId : ''].filter(Boolean).join(' ');
  const invalid = error !== undefined;

  return (
    <div className="flex flex-col gap-1.5">
      <label htmlFor={id} className={hideLabel ? 'sr-only' : 'font-medium text-humus-900'}>
        {label}
      </label>
      {hint ? (
        <p id={hintId} className="text-sm text-loam-700">
          {hint}
        </p>
      ) : null}
      <select
        id={id}
        name={name}
        value={value}
        onChange={onChange}
        aria-invalid={invalid}
        aria-describedby={describedBy || undefined}
        className={`rounded-seed border bg-white px-3 text-humus-900 ${size === 'sm' ? 'min-h-9 py-1 text-sm' : 'min-h-11 py-2 text-base'} ${
          invalid ? 'border-danger-700 ring-1 ring-danger-700' : 'border-loam-400 hover:border-loam-600'
        }`}
      >
        {options.map((option) => (
          <option key={option.value} value={option.value}>
            {option.label}
          </option>
        ))}
      </select>
      {error ? (
        <p id={errorId} className="flex items-start gap-1.5 text-sm font-medium text-danger-700">
          <span aria-hidden="true">✕</span>
          <span>{error}</span>
        </p>
      ) : null}
    </div>
  );
}
