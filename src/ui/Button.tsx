import type { ButtonHTMLAttributes, ReactNode } from 'react';
import { Link, type LinkProps } from 'react-router-dom';

type Variant = 'primary' | 'secondary' | 'danger' | 'quiet';
type Size = 'md' | 'sm';

const base =
  'inline-flex items-center justify-center gap-2 rounded-md font-semibold transition-colors disabled:cursor-not-allowed disabled:opacity-60';
const variants: Record<Variant, string> = {
  primary: 'bg-slate text-paper hover:bg-slate-deep',
  secondary: 'border border-slate/40 bg-white text-slate hover:bg-frost',
  danger: 'bg-ember text-white hover:bg-ember/90',
  quiet: 'text-slate underline-offset-4 hover:underline',
};
const sizes: Record<Size, string> = { md: 'min-h-11 px-4 py-2 text-base', sm: 'min-h-9 px-3 py-1 text-sm' };

export function buttonClass(variant: Variant = 'primary', size: Size = 'md'): string {
  return `${base} ${variants[variant]} ${sizes[size]}`;
}

interface ButtonProps extends ButtonHTMLAttributes<HTMLButtonElement> {
  variant?: Variant;
  size?: Size;
  /** Shows a working label and blocks double submits while a request is under way. */
  busy?: boolean;
  busyLabel?: ReactNode;
}

export function Button({ variant, size, busy = false, busyLabel, children, className = '', disabled, type = 'button', ...rest }: ButtonProps) {
  return (
    <button type={type} className={`${buttonClass(variant, size)} ${className}`} disabled={disabled || busy} aria-busy={busy || undefined} {...rest}>
      {busy ? (busyLabel ?? children) : children}
    </button>
  );
}

interface ButtonLinkProps extends LinkProps {
  variant?: Variant;
  size?: Size;
}

export function ButtonLink({ variant, size, className = '', ...rest }: ButtonLinkProps) {
  return <Link className={`${buttonClass(variant, size)} ${className}`} {...rest} />;
}
