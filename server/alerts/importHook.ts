import { onReadingsChanged, type ReadingsChanged } from '../readings/readingEvents';

type Handler = (change: ReadingsChanged) => Promise<void>;
const handlers = new Set<Handler>();
let hooked = false;

/**
 * The readings hook keeps its listeners for the life of the process; alerting registers through here instead so
 * that stopping it (a server shutting down, a test app closing) also stops it from evaluating after imports.
 */
export function afterEachImport(handler: Handler): () => void {
  if (!hooked) {
    onReadingsChanged(async (change) => {
      for (const h of handlers) await h(change);
    });
    hooked = true;
  }
  handlers.add(handler);
  return () => handlers.delete(handler);
}
