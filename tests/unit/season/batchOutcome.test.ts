import { describe, expect, it } from 'vitest';
import { latestAssessment, plantedExposure, storageRoom, toBatchOutcome, type PlantingFacts } from '../../../shared/season/batchOutcome';
import { exposureReport } from './fixtures';

const through = '2026-04-20T05:00:00.000Z';
const rooms = (cellar: number, garage: number) => [
  { roomId: 1, roomName: 'Cellar', hours: cellar },
  { roomId: 2, roomName: 'Garage', hours: garage },
];

// Hand-computed: 30 grafts planted after 0 freeze h, 10 °C·h below, 40 % callus; 10 grafts after 4 h, 50 °C·h,
// 60 %. Per graft: freeze (0·30 + 4·10)/40 = 1 h, below (10·30 + 50·10)/40 = 20 °C·h, callus (40·30 + 60·10)/40 = 45 %.
const plantings: PlantingFacts[] = [
  { id: 11, plantedOn: '2026-04-02', count: 30, location: 'Bed 3', snapshot: { through, exposure: exposureReport({ belowDH: 10, belowHours: 6, callusPct: 40 }), rooms: rooms(900, 100) } },
  { id: 12, plantedOn: '2026-04-20', count: 10, location: 'North field', snapshot: { through, exposure: exposureReport({ freezeHours: 4, belowDH: 50, belowHours: 30, aboveDH: 2, callusPct: 60 }), rooms: rooms(900, 1300) } },
  { id: 13, plantedOn: '2026-04-09', count: 5, location: ' Bed 3 ', snapshot: { through, exposure: null, rooms: [] } },
];

describe('plantedExposure (per graft planted)', () => {
  it('weights each planting row by the grafts it took out, leaving out rows without exposure', () => {
    const e = plantedExposure(plantings)!;
    expect(e.freezeHours).toBeCloseTo(1, 12);
    expect(e.belowDegreeHours).toBeCloseTo(20, 12);
    expect(e.belowHours).toBeCloseTo((6 * 30 + 30 * 10) / 40, 12);
    expect(e.aboveDegreeHours).toBeCloseTo(0.5, 12);
    expect(e.outsideDegreeHours).toBeCloseTo(20.5, 12);
    expect(e.callusPct).toBeCloseTo(45, 12);
  });

  it('has no callus figure when a row lacks one, and nothing without any measured row', () => {
    const noCallus = { ...plantings[0], snapshot: { through, exposure: exposureReport({}), rooms: [] } };
    expect(plantedExposure([noCallus, plantings[1]])!.callusPct).toBeNull();
    expect(plantedExposure([plantings[2]])).toBeNull();
    expect(plantedExposure([])).toBeNull();
  });
});

describe('storageRoom', () => {
  it('reads the last planting (the longest storage) and takes the room of most hours', () => {
    expect(storageRoom(plantings)).toEqual({ id: 2, name: 'Garage', hours: 1300 });
  });

  it('is null without any room hours', () => {
    expect(storageRoom([plantings[2]])).toBeNull();
  });
});

describe('latestAssessment', () => {
  it('takes the latest date, and the later record on the same date', () => {
    const list = [
      { id: 5, assessedOn: '2026-06-01', grown: 30 },
      { id: 9, assessedOn: '2026-07-15', grown: 28 },
      { id: 7, assessedOn: '2026-07-15', grown: 27 },
    ];
    expect(latestAssessment(list)!.id).toBe(9);
    expect(latestAssessment([])).toBeNull();
  });
});

describe('toBatchOutcome', () => {
  it('sums planting rows, lists places in planting order without repeats, and keeps the latest assessment', () => {
    const batch = { id: 4, code: '26-APL-004', species: 'Apple', cultivar: 'Gala', rootstock: 'M.26', method: 'cleft', grafter: 'Ana', graftedOn: '2026-02-10', count: 50 };
    const o = toBatchOutcome(batch, plantings, [{ id: 1, assessedOn: '2026-07-01', grown: 38 }]);
    expect(o).toMatchObject({
      batchId: 4,
      code: '26-APL-004',
      count: 50,
      planted: 45,
      firstPlantedOn: '2026-04-02',
      lastPlantedOn: '2026-04-20',
      locations: ['Bed 3', 'North field'],
      assessedOn: '2026-07-01',
      grown: 38,
      room: { id: 2, name: 'Garage', hours: 1300 },
    });
    expect(toBatchOutcome(batch, [], [])).toMatchObject({ planted: 0, firstPlantedOn: null, grown: null, room: null, exposure: null, locations: [] });
  });
});
