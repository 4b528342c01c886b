/** What changed when readings arrive; listeners (exposure cache, alert evaluation) register at start-up. */
export interface ReadingsChanged {
  nurseryId: number;
  loggerId: number;
  from: number;
  to: number;
}

type Listener = (change: ReadingsChanged) => Promise<void>;
const listeners: Listener[] = [];

export function onReadingsChanged(listener: Listener): void {
  listeners.push(listener);
}

/** Awaited by the importer, so that when an import answers, caches and alerts already reflect it. */
export async function notifyReadingsChanged(change: ReadingsChanged): Promise<void> {
  for (const listener of listeners) await listener(change);
}
