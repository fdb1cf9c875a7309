import type { ComponentPropsWithRef } from 'react';
import { buttonClasses, type ButtonSize, type ButtonVariant } from './button-styles';
import { Spinner } from './spinner';

type ButtonProps = ComponentPropsWithRef<'button'> & {
  variant?: ButtonVariant;
  size?: ButtonSize;
  /** Shows a spinner and disables the button while a request runs. */
  isPending?: boolean;
};

export function Button({ variant, size, isPending = false, className, disabled, children, type = 'button', ...rest }: ButtonProps) {
  return (
    <button
      type={type}
      className={buttonClasses(variant, size, className)}
      disabled={disabled || isPending}
      aria-busy={isPending || undefined}
      {...rest}
    >
      {isPending && <Spinner />}
      {children}
    </button>
  );
}
