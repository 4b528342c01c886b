import type { ReactNode } from 'react';

/** Usual cautions where the product's advice touches sharp tools, heat or fire; brief, and deferring to local rules. */
export function SafetyNote({ title = 'Working safely', children }: { title?: string; children: ReactNode }) {
  return (
    <aside aria-label={title} className="rounded-md border-l-4 border-callus bg-callus-light px-4 py-3 text-sm text-ink">
      <p className="font-semibold">{title}</p>
      {children}
    </aside>
  );
}

/** For grafting days: knives, wax and heated callusing. */
export function GraftingSafetyNote() {
  return (
    <SafetyNote>
      <ul className="mt-1 list-disc space-y-1 pl-5">
        <li>Grafting knives are razor-sharp: cut away from your hand and body, keep a first-aid kit within reach, and close or sheathe the knife whenever you put it down.</li>
        <li>Grafting wax is melted hot: use a thermostatic pot made for it, never an open flame, and keep it where it cannot be knocked over.</li>
        <li>Heating a callusing room or bench: use only equipment rated for the space, never an unvented fuel-burning heater in a closed room (carbon monoxide), and follow your local electrical and fire codes or a licensed electrician.</li>
      </ul>
    </SafetyNote>
  );
}
