const TONES = {
  completed: 'bg-moss-light text-moss-deep',
  running: 'bg-frost text-slate-deep',
  failed: 'bg-ember-light text-ember',
} as const;
const WORDS = { completed: 'Done', running: 'Running', failed: 'Failed' } as const;

export function ImportStatus({ status }: { status: keyof typeof TONES }) {
  return <span className={`rounded px-2 py-0.5 text-sm font-semibold ${TONES[status]}`}>{WORDS[status]}</span>;
}
