import type { ButtonHTMLAttributes, ReactNode } from 'react';
import { cx } from '../../lib/cx';
import { Icon, type IconName } from './icon';
import { Spinner } from './spinner';

export type ButtonVariant = 'primary' | 'secondary' | 'danger' | 'ghost';

const variants: Record<ButtonVariant, string> = {
  primary: 'bg-accent text-accent-fg hover:bg-accent-strong border-accent',
  secondary: 'bg-surface-raised text-ink border-line-strong hover:bg-surface-sunken',
  danger: 'bg-danger text-danger-fg hover:bg-danger-strong border-danger',
  ghost: 'bg-transparent text-accent border-transparent hover:bg-accent-soft',
};

export function buttonClasses(variant: ButtonVariant = 'primary', className?: string): string {
  return cx(
    'inline-flex min-h-touch min-w-touch items-center justify-center gap-2 rounded-md border-2 px-4 py-2',
    'text-base font-semibold leading-tight transition-colors select-none',
    'disabled:cursor-not-allowed disabled:opacity-60',
    variants[variant],
    className,
  );
}

interface ButtonProps extends ButtonHTMLAttributes<HTMLButtonElement> {
  variant?: ButtonVariant;
  /** Disables the button and shows a spinner while a request runs. */
  pending?: boolean;
  icon?: IconName;
  children?: ReactNode;
}

export function Button({
  variant = 'primary',
  pending = false,
  icon,
  disabled,
  className,
  children,
  type = 'button',
  ...props
}: ButtonProps) {
  return (
    <button
      type={type}
      disabled={disabled || pending}
      aria-busy={pending || undefined}
      className={buttonClasses(variant, className)}
      {...props}
    >
      {pending ? <Spinner size={18} /> : icon && <Icon name={icon} size={20} />}
      {children}
    </button>
  );
}
