import { GRAFT_METHOD_SUGGESTIONS, STORAGE_MEDIUM_SUGGESTIONS } from '../../shared/schemas/batches';

export const METHOD_LIST_ID = 'graft-method-suggestions';
export const MEDIUM_LIST_ID = 'storage-medium-suggestions';

/** Pick lists for the open method and medium fields: the usual words plus what this nursery has typed before. */
export function Suggestions({ usedMethods = [], usedMedia = [] }: { usedMethods?: string[]; usedMedia?: string[] }) {
  const methods = [...new Set([...GRAFT_METHOD_SUGGESTIONS, ...usedMethods])];
  const media = [...new Set([...STORAGE_MEDIUM_SUGGESTIONS, ...usedMedia.filter(Boolean)])];
  return (
    <>
      <datalist id={METHOD_LIST_ID}>
        {methods.map((m) => (
          <option key={m} value={m} />
        ))}
      </datalist>
      <datalist id={MEDIUM_LIST_ID}>
        {media.map((m) => (
          <option key={m} value={m} />
        ))}
      </datalist>
    </>
  );
}
