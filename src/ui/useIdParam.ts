import { useParams } from 'react-router-dom';

/** The route's numeric :id, or null when the address holds something else (which then reads as "not found"). */
export function useIdParam(name = 'id'): number | null {
  const raw = useParams()[name];
  const id = Number(raw);
  return raw && Number.isSafeInteger(id) && id > 0 ? id : null;
}
