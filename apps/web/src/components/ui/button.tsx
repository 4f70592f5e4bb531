// Buttons and button-styled links. Every one is at least 48 px tall and carries visible text,
// so it can be hit with a gloved thumb and found by its name.
import type { ButtonHTMLAttributes, ReactNode } from 'react';
import { Link, type LinkProps } from 'react-router';

export type ButtonVariant = 'primary' | 'secondary' | 'danger' | 'quiet';
export type ButtonSize = 'normal' | 'large';

const base =
  'inline-flex items-center justify-center gap-2 rounded-control px-5 font-semibold ' +
  'border-2 transition-colors select-none disabled:cursor-not-allowed disabled:opacity-60 ' +
  'text-center leading-tight';

const variants: Record<ButtonVariant, string> = {
  primary:
    'bg-primary border-primary text-on-primary hover:bg-primary-hover hover:border-primary-hover',
  secondary: 'bg-surface border-line-strong text-ink hover:bg-sunken',
  danger: 'bg-surface border-danger-line text-danger-ink hover:bg-danger-bg',
  quiet: 'bg-transparent border-transparent text-ink underline underline-offset-4 hover:bg-sunken',
};

const sizes: Record<ButtonSize, string> = {
  normal: 'min-h-touch text-base',
  large: 'min-h-touch-lg text-lg',
};

export function buttonClasses(
  variant: ButtonVariant = 'primary',
  size: ButtonSize = 'normal',
  extra = '',
): string {
  return [base, variants[variant], sizes[size], extra].filter(Boolean).join(' ');
}

interface ButtonProps extends ButtonHTMLAttributes<HTMLButtonElement> {
  variant?: ButtonVariant;
  size?: ButtonSize;
  /** While true the button is disabled and says what it is doing instead of its label. */
  busy?: boolean;
  busyLabel?: string;
  children: ReactNode;
}

export function Button({
  variant = 'primary',
  size = 'normal',
  busy = false,
  busyLabel,
  className = '',
  type = 'button',
  disabled,
  children,
  ...rest
}: ButtonProps) {
  return (
    <button
      type={type}
      className={buttonClasses(variant, size, className)}
      disabled={disabled || busy}
      aria-busy={busy || undefined}
      {...rest}
    >
      {busy && busyLabel ? busyLabel : children}
    </button>
  );
}

interface ButtonLinkProps extends LinkProps {
  variant?: ButtonVariant;
  size?: ButtonSize;
}

export function ButtonLink({
  variant = 'secondary',
  size = 'normal',
  className = '',
  ...rest
}: ButtonLinkProps) {
  return <Link className={buttonClasses(variant, size, className)} {...rest} />;
}
