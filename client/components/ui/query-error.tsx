import { errorMessage } from '../../lib/form-errors';
import { Button } from './button';
import { Notice } from './notice';

type QueryErrorProps = { title: string; error: unknown; onRetry?: () => void; isRetrying?: boolean };

/** A failed read: what failed, why, and a way to try again. */
export function QueryError({ title, error, onRetry, isRetrying }: QueryErrorProps) {
  return (
    <Notice
      tone="error"
      title={title}
      action={
        onRetry && (
          <Button size="sm" onClick={onRetry} isPending={isRetrying}>
            Try again
          </Button>
        )
      }
    >
      {errorMessage(error)}
    </Notice>
  );
}
