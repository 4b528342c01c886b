// Shapes of planting-out outcomes and of the season report built from them.
import type { ExposureReport } from '../exposure/types';

/** Hours a batch spent in one room (by its placements) before planting out. */
export interface RoomStay {
  roomId: number;
  roomName: string;
  hours: number;
}

/**
 * A batch's storage as it stood on the day part of it was planted out, frozen into the planting record so
 * later imports, edits or deleted readings never change a past season's report.
 */
export interface ExposureSnapshot {
  /** Storage was counted up to this instant (ISO 8601, UTC): the start of the planting day in the nursery's zone. */
  through: string;
  /** Null when no logger covered any of the batch's rooms while it was there. */
  exposure: ExposureReport | null;
  rooms: RoomStay[];
}

/** The headline storage figures for the grafts of one batch that were planted out, per graft planted. */
export interface PlantedExposure {
  hoursCovered: number;
  freezeHours: number;
  belowHours: number;
  belowDegreeHours: number;
  aboveHours: number;
  aboveDegreeHours: number;
  /** below + above degree-hours: how far and how long the batch was outside its band. */
  outsideDegreeHours: number;
  /** Null when the batch's species has no callus model. */
  callusPct: number | null;
}

/** What a batch is, as the report groups it. */
export interface BatchDescription {
  code: string;
  /** The species' display name. */
  species: string;
  cultivar: string;
  rootstock: string;
  method: string;
  grafter: string;
  /** YYYY-MM-DD */
  graftedOn: string;
  /** Grafts in the batch. */
  count: number;
}

/** One batch of a season with what is known of its outcome, as the report and the export use it. */
export interface BatchOutcome extends BatchDescription {
  batchId: number;
  /** Grafts planted out so far, over all planting rows. */
  planted: number;
  /** YYYY-MM-DD of the first and last planting; null before any. */
  firstPlantedOn: string | null;
  lastPlantedOn: string | null;
  /** Beds or fields the batch went to, in planting order, without repeats. */
  locations: string[];
  /** The latest assessment; null before any. */
  assessedOn: string | null;
  grown: number | null;
  /** Where the batch spent the most storage hours; null when it has no placements. */
  room: { id: number; name: string; hours: number } | null;
  /** Null when nothing is planted or no logger covered its storage. */
  exposure: PlantedExposure | null;
}

/** A take figure: grafts grown of grafts planted, with its Wilson 95 % interval, all in percent. */
export interface TakeFigure {
  batches: number;
  planted: number;
  grown: number;
  takePct: number;
  lowPct: number;
  highPct: number;
}

export interface TakeGroup extends TakeFigure {
  key: string;
  label: string;
  /** A leftover group ("not recorded", "no logger record"): shown, but never singled out in the summary. */
  catchAll?: true;
}
