/** A polite live region, so a screen reader hears what is loading; the ring is decoration. */
export function Spinner({ label }: { label: string }) {
  return (
    <div role="status" className="flex items-center gap-3 py-8 text-ink-soft">
      <span aria-hidden="true" className="size-5 animate-spin rounded-full border-2 border-frost-deep border-t-slate motion-reduce:animate-none" />
      <span>{label}</span>
    </div>
  );
}
