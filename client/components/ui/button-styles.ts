import { cx } from '../../lib/cx';

export type ButtonVariant = 'primary' | 'secondary' | 'danger' | 'ghost';
export type ButtonSize = 'md' | 'sm';

const VARIANTS: Record<ButtonVariant, string> = {
  primary:
    'bg-signal-500 text-asphalt-950 hover:bg-signal-400 active:bg-signal-600 disabled:bg-asphalt-700 disabled:text-asphalt-400',
  secondary:
    'bg-asphalt-750 text-asphalt-100 ring-1 ring-inset ring-asphalt-600 hover:bg-asphalt-700 hover:ring-asphalt-500 disabled:text-asphalt-500 disabled:ring-asphalt-700',
  danger:
    'bg-stop-950 text-stop ring-1 ring-inset ring-stop/40 hover:bg-stop/20 hover:ring-stop/70 disabled:text-asphalt-500 disabled:ring-asphalt-700 disabled:bg-asphalt-800',
  ghost: 'text-asphalt-200 hover:bg-asphalt-750 hover:text-asphalt-100 disabled:text-asphalt-500',
};

const SIZES: Record<ButtonSize, string> = {
  md: 'min-h-11 px-4 text-[0.9375rem]',
  sm: 'min-h-11 px-3 text-sm',
};

/** Every control is at least 44 px tall so it works with a gloved thumb on a tablet. */
export function buttonClasses(variant: ButtonVariant = 'secondary', size: ButtonSize = 'md', extra?: string): string {
  return cx(
    'inline-flex select-none items-center justify-center gap-2 rounded-lg font-semibold tracking-wide transition-colors',
    'disabled:cursor-not-allowed',
    VARIANTS[variant],
    SIZES[size],
    extra,
  );
}
