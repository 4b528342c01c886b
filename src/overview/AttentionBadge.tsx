import type { AttentionLevel } from '../../shared/overview/roomAttention';

const LOOK: Record<AttentionLevel, { label: string; className: string }> = {
  alarm: { label: 'Act now', className: 'bg-ember text-white' },
  warn: { label: 'Check', className: 'bg-callus-light text-ink' },
  ok: { label: 'Fine', className: 'bg-moss-light text-moss-deep' },
  idle: { label: 'Not in use', className: 'bg-frost text-slate-deep' },
};

/** Words, not only colour, carry the level (WCAG 1.4.1). */
export function AttentionBadge({ level }: { level: AttentionLevel }) {
  const { label, className } = LOOK[level];
  return <span className={`inline-block shrink-0 rounded-full px-2.5 py-0.5 text-sm font-semibold ${className}`}>{label}</span>;
}
