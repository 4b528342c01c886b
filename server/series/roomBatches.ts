import { Op } from 'sequelize';
import { Batch } from '../batches/batch.model';
import { BatchPlacement } from '../batches/batchPlacement.model';
import { profilesOf } from '../profiles/profiles.service';

const iso = (t: number) => new Date(t).toISOString();

/**
 * What the room chart draws behind and on the readings: for each species with batches in the room during [from, to],
 * its band and freeze limit over the stretches it was there; and each batch arriving or leaving within the range.
 */
export async function roomBatchMarks(nurseryId: number, roomId: number, from: number, to: number) {
  const stays = await BatchPlacement.findAll({
    where: { roomId, placedFrom: { [Op.lte]: new Date(to) }, [Op.or]: [{ placedTo: null }, { placedTo: { [Op.gt]: new Date(from) } }] },
    include: [{ model: Batch, as: 'batch', where: { nurseryId }, attributes: ['id', 'code', 'speciesKey'] }],
    order: [['placedFrom', 'ASC']],
  });
  const profiles = stays.length ? await profilesOf(nurseryId) : new Map();
  const bySpecies = new Map<string, { from: number; to: number }[]>();
  const moves: { t: string; batchId: number; code: string; direction: 'in' | 'out' }[] = [];
  for (const stay of stays) {
    const batch = (stay as BatchPlacement & { batch: Batch }).batch;
    const start = stay.placedFrom.getTime();
    const end = stay.placedTo?.getTime() ?? null;
    const spans = bySpecies.get(batch.speciesKey) ?? [];
    const span = { from: Math.max(from, start), to: Math.min(to, end ?? to) };
    const last = spans.at(-1);
    if (last && span.from <= last.to) last.to = Math.max(last.to, span.to);
    else spans.push(span);
    bySpecies.set(batch.speciesKey, spans);
    if (start >= from) moves.push({ t: iso(start), batchId: batch.id, code: batch.code, direction: 'in' });
    if (end !== null && end <= to) moves.push({ t: iso(end), batchId: batch.id, code: batch.code, direction: 'out' });
  }
  const species = [...bySpecies].flatMap(([key, spans]) => {
    const p = profiles.get(key);
    return p ? [{ key, name: p.name, freezeC: p.freezeC, band: p.band, spans: spans.map((s) => ({ from: iso(s.from), to: iso(s.to) })) }] : [];
  });
  return { species, moves: moves.sort((a, b) => a.t.localeCompare(b.t)) };
}
