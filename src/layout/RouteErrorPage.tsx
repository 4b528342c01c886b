import { isRouteErrorResponse, useRouteError } from 'react-router-dom';
import { Button } from '../ui/Button';
import { ErrorNotice } from '../ui/ErrorNotice';
import { PlainFrame } from './PlainFrame';

/** The last line of defence: a page that failed to render says so and offers a reload instead of going blank. */
export function RouteErrorPage() {
  const error = useRouteError();
  const shown = isRouteErrorResponse(error) ? new Error(`${error.status} ${error.statusText}`) : error;
  return (
    <PlainFrame>
      <h1 className="mb-4 text-2xl font-bold text-slate-deep">This page broke</h1>
      <ErrorNotice title="Something went wrong while showing this page" error={shown} />
      <Button className="mt-4" onClick={() => window.location.reload()}>
        Reload the page
      </Button>
    </PlainFrame>
  );
}
