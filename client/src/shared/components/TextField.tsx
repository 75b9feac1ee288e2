import { useId, type ChangeEvent, type InputHTMLAttributes } from 'react';

type TextFieldProps = {
  label: string;
  name: string;
  value: string;
  onChange: (event: ChangeEvent<HTMLInputElement>) => void;
  /** What the value means or what is expected, shown under the label. */
  hint?: string;
  /** The unit the number is in (seeds/m², ha), shown at the end of the input. */
  unit?: string;
  error?: string;
  type?: 'text' | 'email' | 'password' | 'number';
} & Pick<
  InputHTMLAttributes<HTMLInputElement>,
  'autoComplete' | 'inputMode' | 'required' | 'min' | 'max' | 'step' | 'spellCheck'
>;

/** A labelled input whose hint, unit and message are all tied to it for assistive technology. */
export function TextField({
  label,
  name,
  value,
  onChange,
  hint,
  unit,
  error,
  type = 'text',
  ...rest
}: TextFieldProps) {
  const id = useId();
  const hintId = `${id}-hint`;
  const unitId = `${id}-unit`;
  const errorId = `${id}-error`;
  const describedBy = [hint ? hintId : '', unit ? unitId : '', error ? errorId : '']
    .filter(Boolean)
    .join(' ');
  const invalid = error !== undefined;

  return (
    <div className="flex flex-col gap-1.5">
      <label htmlFor={id} className="font-medium text-humus-900">
        {label}
        {rest.required ? null : <span className="font-normal text-loam-600"> (optional)</span>}
      </label>
      {hint ? (
        <p id={hintId} className="text-sm text-loam-700">
          {hint}
        </p>
      ) : null}
      <div
        // The focus ring sits on the wrapper so it surrounds the unit as well as the input.
        className={`flex items-stretch overflow-hidden rounded-seed border bg-white transition-colors focus-within:border-humus-900 focus-within:outline-3 focus-within:outline-offset-2 focus-within:outline-clay-600 ${
          invalid ? 'border-danger-700 ring-1 ring-danger-700' : 'border-loam-400 hover:border-loam-600'
        }`}
      >
        <input
          id={id}
          name={name}
          type={type}
          value={value}
          onChange={onChange}
          aria-invalid={invalid}
          aria-describedby={describedBy || undefined}
          className="min-h-11 w-full min-w-0 bg-transparent px-3 py-2 text-base text-humus-900 placeholder:text-loam-500 focus-visible:outline-none"
          {...rest}
        />
        {unit ? (
          <span
            id={unitId}
            className="flex items-center border-l border-silt-300 bg-silt-100 px-3 text-sm text-loam-700"
          >
            {unit}
          </span>
        ) : null}
      </div>
      {error ? (
        <p id={errorId} className="flex items-start gap-1.5 text-sm font-medium text-danger-700">
          <span aria-hidden="true">✕</span>
          <span>{error}</span>
        </p>
      ) : null}
    </div>
  );
}
