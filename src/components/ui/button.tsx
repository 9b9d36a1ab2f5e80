import type { ComponentProps } from 'react';
import { Spinner } from './spinner';

type Variant = 'primary' | 'secondary' | 'danger' | 'quiet';
type Size = 'sm' | 'md';

const variants: Record<Variant, string> = {
  primary: 'bg-copper text-white hover:bg-copper-dark border border-copper hover:border-copper-dark',
  secondary: 'bg-surface text-ink border border-rule hover:border-muted hover:bg-paper',
  danger: 'bg-surface text-brick border border-brick/40 hover:bg-brick hover:text-white hover:border-brick',
  quiet: 'bg-transparent text-ink border border-transparent hover:bg-rule/50',
};

const sizes: Record<Size, string> = {
  sm: 'h-7 px-2.5 text-sm',
  md: 'h-9 px-4 text-sm',
};

export function buttonClasses(variant: Variant = 'primary', size: Size = 'md'): string {
  return [
    'inline-flex items-center justify-center gap-2 rounded-md font-medium whitespace-nowrap',
    'transition-colors disabled:cursor-not-allowed disabled:opacity-60',
    variants[variant],
    sizes[size],
  ].join(' ');
}

export type ButtonProps = ComponentProps<'button'> & {
  variant?: Variant;
  size?: Size;
  /** Shows a spinner and blocks a second click; the label stays, so its name is stable. */
  pending?: boolean;
};

export function Button({
  variant = 'primary',
  size = 'md',
  pending = false,
  type = 'button',
  className = '',
  disabled,
  children,
  ...rest
}: ButtonProps) {
  return (
    <button
      type={type}
      className={`${buttonClasses(variant, size)} ${className}`}
      disabled={disabled || pending}
      aria-busy={pending || undefined}
      {...rest}
    >
      {pending ? <Spinner /> : null}
      {children}
    </button>
  );
}
