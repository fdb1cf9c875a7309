import { Link, type LinkProps } from 'react-router-dom';
import { cx } from '../lib/cx';

/** An inline link with a 44 px tall hit area. */
export function TextLink({ className, ...rest }: LinkProps) {
  return (
    <Link
      className={cx('inline-flex min-h-11 items-center font-semibold text-signal-300 underline-offset-4 hover:underline', className)}
      {...rest}
    />
  );
}
