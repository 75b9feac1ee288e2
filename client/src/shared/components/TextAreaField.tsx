import { useId, type ChangeEvent } from 'react';

type TextAreaFieldProps = {
  label: string;
  name: string;
  value: string;
  onChange: (event: ChangeEvent<HTMLTextAreaElement>) => void;
  hint?: string;
  error?: string;
  rows?: number;
  maxLength?: number;
};

/** Longer free text (notes, a description), labelled and described like TextField; always optional. */
export function TextAreaField({
  label,
  name,
  value,
  onChange,
  hint,
  error,
  rows = 3,
  maxLength,
}: TextAreaFieldProps) {
  const id = useId();
  const describedBy = [hint ? `${id}-hint` : '', error ? `${id}-error` : ''].filter(Boolean).join(' ');
  return (
    <div className="flex flex-col gap-1.5">
      <label htmlFor={id} className="font-medium text-humus-900">
        {label}
        <span className="font-normal text-loam-600"> (optional)</span>
      </label>
      {hint ? (
        <p id={`${id}-hint`} className="text-sm text-loam-700">
          {hint}
        </p>
      ) : null}
      <textarea
        id={id}
        name={name}
        value={value}
        rows={rows}
        maxLength={maxLength}
        onChange={onChange}
        aria-invalid={error !== undefined}
        aria-describedby={describedBy || undefined}
        className={`rounded-seed border bg-white px-3 py-2 text-base text-humus-900 ${
          error ? 'border-danger-700 ring-1 ring-danger-700' : 'border-loam-400 hover:border-loam-600'
        }`}
      />
      {error ? (
        <p id={`${id}-error`} className="flex items-start gap-1.5 text-sm font-medium text-danger-700">
          <span aria-hidden="true">✕</span>
          <span>{error}</span>
        </p>
      ) : null}
    </div>
  );
}
