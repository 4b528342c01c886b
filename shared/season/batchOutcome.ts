// One batch's outcome from its records: planting rows (each with its frozen storage snapshot) and assessments.
import type { BatchDescription, BatchOutcome, ExposureSnapshot, PlantedExposure } from './types';

export interface BatchFacts extends BatchDescription {
  id: number;
}

export interface PlantingFacts {
  id: number;
  plantedOn: string;
  count: number;
  location: string;
  snapshot: ExposureSnapshot | null;
}

export interface AssessmentFacts {
  id: number;
  assessedOn: string;
  grown: number;
}

/** Planting rows in the order they happened: by date, then by the order they were recorded. */
function inPlantingOrder(plantings: readonly PlantingFacts[]): PlantingFacts[] {
  return [...plantings].sort((a, b) => (a.plantedOn < b.plantedOn ? -1 : a.plantedOn > b.plantedOn ? 1 : a.id - b.id));
}

/** The latest by date; on the same date the one recorded last (a correction made that day). */
export function latestAssessment<T extends AssessmentFacts>(assessments: readonly T[]): T | null {
  let latest: T | null = null;
  for (const a of assessments) {
    if (!latest || a.assessedOn > latest.assessedOn || (a.assessedOn === latest.assessedOn && a.id > latest.id)) latest = a;
  }
  return latest;
}

/**
 * Per graft planted: each planting row's snapshot weighted by the grafts it took out, because grafts planted in
 * March missed what the rest went through in April. Rows without exposure are left out of the weights; null
 * when none has any. Callus is averaged only when every weighted row carries it (one species, one model).
 */
export function plantedExposure(plantings: readonly PlantingFacts[]): PlantedExposure | null {
  const measured = plantings.filter((p) => p.snapshot?.exposure && p.count > 0);
  if (measured.length === 0) return null;
  const weight = measured.reduce((sum, p) => sum + p.count, 0);
  const mean = (pick: (p: PlantingFacts) => number) => measured.reduce((sum, p) => sum + pick(p) * p.count, 0) / weight;
  const exposureOf = (p: PlantingFacts) => p.snapshot!.exposure!;
  const belowDegreeHours = mean((p) => exposureOf(p).below.degreeHours);
  const aboveDegreeHours = mean((p) => exposureOf(p).above.degreeHours);
  const withCallus = measured.every((p) => exposureOf(p).callus !== undefined);
  return {
    hoursCovered: mean((p) => exposureOf(p).hoursCovered),
    freezeHours: mean((p) => exposureOf(p).freeze.hours),
    belowHours: mean((p) => exposureOf(p).below.hours),
    belowDegreeHours,
    aboveHours: mean((p) => exposureOf(p).above.hours),
    aboveDegreeHours,
    outsideDegreeHours: belowDegreeHours + aboveDegreeHours,
    callusPct: withCallus ? mean((p) => exposureOf(p).callus!.progressPct) : null,
  };
}

/**
 * The room of most storage hours, read from the last planting's snapshot: it covers the longest storage, that
 * of the grafts planted last. Ties go to the room listed first (the earlier stay).
 */
export function storageRoom(plantings: readonly PlantingFacts[]): BatchOutcome['room'] {
  const last = inPlantingOrder(plantings.filter((p) => p.snapshot)).pop();
  let best: BatchOutcome['room'] = null;
  for (const stay of last?.snapshot?.rooms ?? []) {
    if (stay.hours > 0 && (!best || stay.hours > best.hours)) best = { id: stay.roomId, name: stay.roomName, hours: stay.hours };
  }
  return best;
}

export function toBatchOutcome({ id, ...description }: BatchFacts, plantings: readonly PlantingFacts[], assessments: readonly AssessmentFacts[]): BatchOutcome {
  const ordered = inPlantingOrder(plantings);
  const latest = latestAssessment(assessments);
  return {
    batchId: id,
    ...description,
    planted: plantings.reduce((sum, p) => sum + p.count, 0),
    firstPlantedOn: ordered[0]?.plantedOn ?? null,
    lastPlantedOn: ordered.at(-1)?.plantedOn ?? null,
    locations: [...new Set(ordered.map((p) => p.location.trim()).filter(Boolean))],
    assessedOn: latest?.assessedOn ?? null,
    grown: latest?.grown ?? null,
    room: storageRoom(plantings),
    exposure: plantedExposure(plantings),
  };
}
