/** The mark from the favicon beside the name; the name is the accessible text. */
export function Brand({ className = '' }: { className?: string }) {
  return (
    <span className={`inline-flex items-center gap-2 text-lg font-bold tracking-wide ${className}`}>
      <img src="/favicon.svg" alt="" width={28} height={28} className="rounded-md ring-1 ring-frost/40" />
      Coldknit
    </span>
  );
}
