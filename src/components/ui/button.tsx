// Buttons and links that look like buttons, in three weights. `pending`
// disables the button and shows progress so a form cannot be sent twice.
import type { ComponentProps } from 'react';
import { Link } from 'react-router-dom';
import { Spinner } from './spinner';

export type ButtonVariant = 'primary' | 'secondary' | 'quiet';

const base =
  'inline-flex min-h-10 items-center justify-center gap-2 rounded-md px-4 py-2 text-sm font-semibold transition-colors ' +
  'focus-visible:outline-3 focus-visible:outline-offset-2 focus-visible:outline-accent disabled:cursor-not-allowed disabled:opacity-60';

const variants: Record<ButtonVariant, string> = {
  primary: 'bg-accent text-white hover:bg-accent-strong',
  secondary: 'border border-ink-faint bg-paper-raised text-ink hover:border-ink hover:bg-paper-sunk',
  quiet: 'text-accent-strong underline-offset-4 hover:underline',
};

export function buttonClasses(variant: ButtonVariant = 'primary', className = ''): string {
  return `${base} ${variants[variant]} ${className}`;
}

interface ButtonProps extends ComponentProps<'button'> {
  variant?: ButtonVariant;
  pending?: boolean;
  pendingLabel?: string;
}

export function Button({
  variant = 'primary',
  pending = false,
  pendingLabel,
  type = 'button',
  disabled,
  className,
  children,
  ...rest
}: ButtonProps) {
  return (
    <button
      type={type}
      disabled={disabled || pending}
      aria-busy={pending || undefined}
      className={buttonClasses(variant, className)}
      {...rest}
    >
      {pending && <Spinner />}
      {pending && pendingLabel ? pendingLabel : children}
    </button>
  );
}

interface ButtonLinkProps extends ComponentProps<typeof Link> {
  variant?: ButtonVariant;
}

export function ButtonLink({ variant = 'secondary', className, ...rest }: ButtonLinkProps) {
  return <Link className={buttonClasses(variant, className)} {...rest} />;
}
