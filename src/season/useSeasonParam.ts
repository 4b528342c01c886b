import { useParams } from 'react-router-dom';
import { seasonParam } from '../../shared/season/schemas';

/** The :season of the address when it is a season the server accepts, else null (the page shows "not found"). */
export function useSeasonParam(): number | null {
  const parsed = seasonParam.safeParse(useParams());
  return parsed.success ? parsed.data.season : null;
}
