import { DateTime } from 'luxon';
import { useFieldArray } from 'react-hook-form';
import { useNavigate } from 'react-router-dom';
import { bulkBatchBody, type BulkBatchInput } from '../../shared/schemas/batches';
import { useCurrentSession } from '../auth/useCurrentSession';
import { useProfiles, type ListedProfile } from '../profiles/queries';
import { useRooms, type Room } from '../rooms/queries';
import { fromZonedInputValue, zoneAbbreviation } from '../time/nurseryTime';
import { Button } from '../ui/Button';
import { Field, Input } from '../ui/Field';
import { FormActions } from '../ui/FormActions';
import { PageHeader } from '../ui/PageHeader';
import { GraftingSafetyNote } from '../ui/SafetyNote';
import { Panel } from '../ui/Panel';
import { QueryResult } from '../ui/QueryResult';
import { useZodForm } from '../ui/useZodForm';
import { useCreateBatchDay } from './queries';
import { readRoomId, RoomPicker } from './RoomPicker';
import { SpeciesSelect } from './SpeciesSelect';
import { MEDIUM_LIST_ID, METHOD_LIST_ID, Suggestions } from './Suggestions';

type Row = BulkBatchInput['rows'][number];
const emptyRow = (species = ''): Row => ({ species, scionCultivar: '', rootstock: '', count: '', code: '', method: '', storageMedium: '', notes: '' });

function GraftingDayForm({ rooms, profiles }: { rooms: Room[]; profiles: ListedProfile[] }) {
  const zone = useCurrentSession().nursery.timeZone;
  const today = DateTime.now().setZone(zone).toISODate()!;
  const create = useCreateBatchDay();
  const navigate = useNavigate();
  const { register, handleSubmit, formState, control, getValues } = useZodForm(bulkBatchBody, {
    defaultValues: { graftedOn: today, grafter: '', method: '', storageMedium: '', placedAt: undefined, rows: [emptyRow()] },
  });
  const rows = useFieldArray({ control, name: 'rows' });
  const { errors } = formState;
  return (
    <form
      noValidate
      className="flex flex-col gap-6"
      onSubmit={handleSubmit((body) =>
        create.mutate(body, { onSuccess: () => navigate(`/batches?graftedFrom=${body.graftedOn}&graftedTo=${body.graftedOn}&sort=code&order=asc`) }),
      )}
    >
      <Suggestions />
      <Panel title="The day" description="What all of this day's batches share. A row below can name its own method or medium.">
        <div className="grid gap-4 sm:grid-cols-2 lg:grid-cols-3">
          <Field label="Grafted on" error={errors.graftedOn?.message}>
            {(c) => <Input {...c} type="date" max={today} {...register('graftedOn')} />}
          </Field>
          <Field label="Grafted by" error={errors.grafter?.message}>
            {(c) => <Input {...c} autoComplete="name" {...register('grafter')} />}
          </Field>
          <Field label="Into the room" error={errors.roomId?.message}>
            {(c) => <RoomPicker {...c} rooms={rooms} placeholder="Choose a room…" {...register('roomId', { setValueAs: readRoomId })} />}
          </Field>
          <Field label="In the room since" hint={`On the nursery's clock (${zoneAbbreviation(zone)}). Leave empty for now.`} error={errors.placedAt?.message}>
            {(c) => <Input {...c} type="datetime-local" {...register('placedAt', { setValueAs: (v: string) => (v ? fromZonedInputValue(v, zone) : undefined) })} />}
          </Field>
          <Field label="Method" hint="Whip-and-tongue, cleft, chip bud… or your own word." error={errors.method?.message}>
            {(c) => <Input {...c} list={METHOD_LIST_ID} {...register('method')} />}
          </Field>
          <Field label="Storage medium" error={errors.storageMedium?.message}>
            {(c) => <Input {...c} list={MEDIUM_LIST_ID} {...register('storageMedium')} />}
          </Field>
        </div>
      </Panel>
      <Panel title="Batches" description="One row per species, scion and rootstock. Leave the code empty to number it (year, species letters, next number).">
        <ol className="flex flex-col gap-4">
          {rows.fields.map((field, i) => {
            const e = errors.rows?.[i];
            return (
              <li key={field.id} className="rounded-md border border-frost-deep p-3">
                <fieldset className="grid gap-3 sm:grid-cols-2 lg:grid-cols-4">
                  <legend className="mb-2 font-semibold text-slate-deep">Batch {i + 1}</legend>
                  <Field label="Species" error={e?.species?.message}>
                    {(c) => <SpeciesSelect {...c} profiles={profiles} placeholder="Choose…" {...register(`rows.${i}.species`)} />}
                  </Field>
                  <Field label="Scion cultivar" error={e?.scionCultivar?.message}>
                    {(c) => <Input {...c} {...register(`rows.${i}.scionCultivar`)} />}
                  </Field>
                  <Field label="Rootstock" error={e?.rootstock?.message}>
                    {(c) => <Input {...c} {...register(`rows.${i}.rootstock`)} />}
                  </Field>
                  <Field label="Grafts" error={e?.count?.message}>
                    {(c) => <Input {...c} type="number" inputMode="numeric" min={1} {...register(`rows.${i}.count`)} />}
                  </Field>
                  <Field label="Code" hint="Optional" error={e?.code?.message}>
                    {(c) => <Input {...c} className="font-mono" spellCheck={false} {...register(`rows.${i}.code`)} />}
                  </Field>
                  <Field label="Method" hint="If not the day's" error={e?.method?.message}>
                    {(c) => <Input {...c} list={METHOD_LIST_ID} {...register(`rows.${i}.method`)} />}
                  </Field>
                  <Field label="Medium" hint="If not the day's" error={e?.storageMedium?.message}>
                    {(c) => <Input {...c} list={MEDIUM_LIST_ID} {...register(`rows.${i}.storageMedium`)} />}
                  </Field>
                  <Field label="Notes" error={e?.notes?.message}>
                    {(c) => <Input {...c} {...register(`rows.${i}.notes`)} />}
                  </Field>
                </fieldset>
                {rows.fields.length > 1 && (
                  <Button variant="quiet" size="sm" className="mt-2" onClick={() => rows.remove(i)}>
                    Remove batch {i + 1}
                  </Button>
                )}
              </li>
            );
          })}
        </ol>
        {errors.rows?.message && <p className="mt-2 text-sm font-semibold text-ember">{errors.rows.message}</p>}
        <Button variant="secondary" className="mt-4" onClick={() => rows.append(emptyRow(getValues(`rows.${rows.fields.length - 1}.species`)))}>
          Add another batch
        </Button>
      </Panel>
      <FormActions submitLabel="Save the grafting day" busyLabel="Saving…" busy={create.isPending} error={create.error} cancelTo="/batches" />
    </form>
  );
}

export function GraftingDayPage() {
  const rooms = useRooms();
  const profiles = useProfiles();
  return (
    <>
      <PageHeader title="Record a grafting day" back={{ to: '/batches', label: 'Batches' }} />
      <div className="mb-6">
        <GraftingSafetyNote />
      </div>
      <QueryResult query={rooms} loading="Loading rooms…" failed="Could not load the rooms">
        {(roomList) => (
          <QueryResult query={profiles} loading="Loading species…" failed="Could not load the species profiles">
            {(profileList) => <GraftingDayForm rooms={roomList} profiles={profileList} />}
          </QueryResult>
        )}
      </QueryResult>
    </>
  );
}
