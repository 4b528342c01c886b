import { isApiError } from '../api/client';
import { Button } from './Button';

export function errorMessage(error: unknown): string {
  if (isApiError(error)) return error.message;
  if (error instanceof Error && error.message) return error.message;
  return 'Something went wrong.';
}

interface ErrorNoticeProps {
  error: unknown;
  title?: string;
  onRetry?: () => void;
}

export function ErrorNotice({ error, title = 'That did not work', onRetry }: ErrorNoticeProps) {
  return (
    <div role="alert" className="rounded-md border-l-4 border-ember bg-ember-light px-4 py-3 text-ink">
      <p className="font-semibold">{title}</p>
      <p>{errorMessage(error)}</p>
      {onRetry && (
        <Button variant="secondary" size="sm" className="mt-2" onClick={onRetry}>
          Try again
        </Button>
      )}
    </div>
  );
}
