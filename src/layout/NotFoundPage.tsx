import { ButtonLink } from '../ui/Button';
import { PageHeader } from '../ui/PageHeader';

/** Inside the app frame for unknown addresses and for records that do not exist (or belong to another nursery). */
export function NotFoundPage({ what = 'page' }: { what?: string }) {
  return (
    <div className="max-w-xl">
      <PageHeader title={`No such ${what}`} description={`Nothing lives at this address. The ${what} may have been removed, or the link is mistyped.`} />
      <ButtonLink to="/rooms" variant="secondary">
        Go to rooms
      </ButtonLink>
    </div>
  );
}
