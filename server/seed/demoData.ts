import type { RoomKind } from '../../shared/schemas/rooms';

// An invented nursery: names of places, people and equipment are made up for the demo.
export const DEMO_NURSERY = { name: 'Brackenfold Nursery', timeZone: 'America/Chicago' };

/** The grafting season the demo shows starts here; loggers have been in place since. */
export const DEMO_SEASON_START = new Date('2026-11-02T06:00:00Z');

export const DEMO_ROOMS: { name: string; kind: RoomKind; notes: string }[] = [
  { name: 'Root cellar', kind: 'basement', notes: 'Under the packing shed. Steady, slightly damp; apple and pear benches on the north wall.' },
  { name: 'North garage', kind: 'garage', notes: 'Unheated. Drops below freezing on clear nights; move grafts out before a cold front.' },
  { name: 'Callus room', kind: 'back room', notes: 'Heated callusing room for walnut and chestnut. Check the heater daily.' },
  { name: 'Crisper fridge', kind: 'fridge', notes: 'Scion wood and small batches of stone fruit grafts.' },
];

export const DEMO_LOGGERS = [
  { label: 'K-01', serial: 'BF-2219-001', room: 'Root cellar', notes: 'Mid-height on the bench post.' },
  { label: 'K-02', serial: 'BF-2219-002', room: 'North garage', notes: 'By the door, the coldest corner.' },
  { label: 'K-03', serial: 'BF-2219-003', room: 'North garage', notes: 'Back wall, next to the grafting boxes.' },
  { label: 'K-04', serial: 'BF-2219-004', room: 'Callus room', notes: 'At union height in the hot-callus box.' },
  { label: 'K-05', serial: 'BF-2219-005', room: 'Crisper fridge', notes: 'Top shelf.' },
];
