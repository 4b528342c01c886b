import { BATCH_SORT_KEYS, BATCH_STATUSES, type BatchListQuery, type BatchSortKey } from '../../shared/schemas/batches';
import type { ListedProfile } from '../profiles/queries';
import type { Room } from '../rooms/queries';
import { Field, Input, Select } from '../ui/Field';
import { STATUS_LABEL } from './batchStatus';
import { RoomPicker } from './RoomPicker';
import { SpeciesSelect } from './SpeciesSelect';

const SORT_LABEL: Record<BatchSortKey, string> = {
  code: 'Code',
  graftedOn: 'Grafting day',
  species: 'Species',
  scionCultivar: 'Scion cultivar',
  rootstock: 'Rootstock',
  count: 'Number of grafts',
  status: 'Status',
  room: 'Room',
};

interface BatchFiltersProps {
  filters: BatchListQuery;
  onChange: (next: BatchListQuery) => void;
  profiles: ListedProfile[];
  rooms: Room[];
}

/** Every filter and the sort live in the address, so a filtered list can be bookmarked or sent to someone. */
export function BatchFilters({ filters, onChange, profiles, rooms }: BatchFiltersProps) {
  const set = (key: keyof BatchListQuery) => (value: string) => onChange({ ...filters, [key]: value || undefined });
  return (
    <form role="search" aria-label="Filter batches" className="mb-6 grid gap-4 sm:grid-cols-2 lg:grid-cols-4" onSubmit={(e) => e.preventDefault()}>
      <Field label="Cultivar or rootstock">
        {(c) => <Input {...c} type="search" value={filters.cultivar ?? ''} onChange={(e) => set('cultivar')(e.target.value)} placeholder="Any" />}
      </Field>
      <Field label="Species">
        {(c) => <SpeciesSelect {...c} profiles={profiles} placeholder="Any species" value={filters.species ?? ''} onChange={(e) => set('species')(e.target.value)} />}
      </Field>
      <Field label="Status">
        {(c) => (
          <Select {...c} value={filters.status ?? ''} onChange={(e) => set('status')(e.target.value)}>
            <option value="">Any status</option>
            {BATCH_STATUSES.map((s) => (
              <option key={s} value={s}>
                {STATUS_LABEL[s]}
              </option>
            ))}
          </Select>
        )}
      </Field>
      <Field label="Room now">
        {(c) => (
          <RoomPicker {...c} rooms={rooms} placeholder="Any room" value={filters.roomId === undefined ? '' : String(filters.roomId)} onChange={(e) => set('roomId')(e.target.value)} />
        )}
      </Field>
      <Field label="Grafted from">
        {(c) => <Input {...c} type="date" value={filters.graftedFrom ?? ''} onChange={(e) => set('graftedFrom')(e.target.value)} />}
      </Field>
      <Field label="Grafted until">
        {(c) => <Input {...c} type="date" value={filters.graftedTo ?? ''} onChange={(e) => set('graftedTo')(e.target.value)} />}
      </Field>
      <Field label="Sort by">
        {(c) => (
          <Select {...c} value={filters.sort ?? 'graftedOn'} onChange={(e) => set('sort')(e.target.value)}>
            {BATCH_SORT_KEYS.map((k) => (
              <option key={k} value={k}>
                {SORT_LABEL[k]}
              </option>
            ))}
          </Select>
        )}
      </Field>
      <Field label="Order">
        {(c) => (
          <Select {...c} value={filters.order ?? 'desc'} onChange={(e) => set('order')(e.target.value)}>
            <option value="desc">Newest, highest or Z first</option>
            <option value="asc">Oldest, lowest or A first</option>
          </Select>
        )}
      </Field>
    </form>
  );
}
