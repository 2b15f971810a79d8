import type { ButtonHTMLAttributes } from 'react';
import { Link, type LinkProps } from 'react-router-dom';

type Variant = 'primary' | 'secondary' | 'quiet' | 'danger';

const base =
  'inline-flex min-h-11 items-center justify-center gap-2 rounded-md px-4 py-2 text-sm font-semibold transition-colors disabled:cursor-not-allowed disabled:opacity-50';
const variants: Record<Variant, string> = {
  primary: 'bg-steel text-white hover:bg-steel-dark',
  secondary: 'border border-rule bg-card text-ink hover:border-brass',
  quiet: 'text-steel hover:bg-rule/50',
  danger: 'bg-error text-white hover:opacity-90',
};

export const buttonClass = (variant: Variant = 'primary', extra = '') => `${base} ${variants[variant]} ${extra}`;

export function Button({
  variant = 'primary',
  busy,
  className = '',
  children,
  type = 'button',
  ...rest
}: ButtonHTMLAttributes<HTMLButtonElement> & { variant?: Variant; busy?: boolean }) {
  return (
    <button
      type={type}
      className={buttonClass(variant, className)}
      disabled={busy || rest.disabled}
      aria-busy={busy}
      {...rest}
    >
      {busy && (
        <span className="size-4 animate-spin rounded-full border-2 border-current border-t-transparent" aria-hidden />
      )}
      {children}
    </button>
  );
}

export function ButtonLink({ variant = 'primary', className = '', ...rest }: LinkProps & { variant?: Variant }) {
  return <Link className={buttonClass(variant, `no-underline ${className}`)} {...rest} />;
}
