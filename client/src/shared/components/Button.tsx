import type { ButtonHTMLAttributes, MouseEvent } from 'react';
import { Spinner } from './Spinner';

type Variant = 'primary' | 'secondary' | 'quiet' | 'danger';
type Size = 'md' | 'sm';

const base =
  'inline-flex items-center justify-center gap-2 rounded-seed font-medium transition-colors select-none ' +
  'aria-disabled:cursor-not-allowed disabled:cursor-not-allowed disabled:opacity-60';

const variants: Record<Variant, string> = {
  // Solid humus: the darkest soil carries the one main action on a page.
  primary: 'bg-humus-900 text-silt-50 hover:bg-humus-700 active:bg-humus-950 shadow-sm',
  secondary: 'border border-loam-400 bg-silt-50 text-humus-900 hover:border-loam-600 hover:bg-silt-100',
  quiet: 'text-humus-900 underline-offset-4 hover:bg-silt-200/70 hover:underline',
  danger: 'border border-danger-700 bg-silt-50 text-danger-700 hover:bg-danger-50',
};

const sizes: Record<Size, string> = {
  md: 'min-h-11 px-4 py-2 text-base',
  sm: 'min-h-9 px-3 py-1.5 text-sm',
};

/** The button look, for links that act as buttons (a router Link to the next step). */
export function buttonClasses(variant: Variant = 'primary', size: Size = 'md'): string {
  return `${base} ${variants[variant]} ${sizes[size]}`;
}

type ButtonProps = ButtonHTMLAttributes<HTMLButtonElement> & {
  variant?: Variant;
  size?: Size;
  /** While true the button stays focusable but ignores presses and says what it is doing. */
  pending?: boolean;
  pendingLabel?: string;
};

export function Button({
  variant = 'primary',
  size = 'md',
  pending = false,
  pendingLabel,
  className = '',
  type = 'button',
  onClick,
  children,
  ...rest
}: ButtonProps) {
  // aria-disabled rather than disabled keeps focus on the button while the request runs,
  // so a keyboard user is not thrown back to the top of the page.
  const handleClick = (event: MouseEvent<HTMLButtonElement>) => {
    if (pending) {
      event.preventDefault();
      return;
    }
    onClick?.(event);
  };
  return (
    <button
      type={type}
      className={`${buttonClasses(variant, size)} ${pending ? 'cursor-progress' : ''} ${className}`}
      aria-disabled={pending || undefined}
      aria-busy={pending || undefined}
      onClick={handleClick}
      {...rest}
    >
      {pending ? (
        <>
          <Spinner />
          <span>{pendingLabel ?? children}</span>
        </>
      ) : (
        children
      )}
    </button>
  );
}
