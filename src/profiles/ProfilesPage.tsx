import { Link } from 'react-router-dom';
import { useCurrentSession, useRoleAtLeast } from '../auth/useCurrentSession';
import { formatTemperature } from '../charts/displayUnits';
import { PageHeader } from '../ui/PageHeader';
import { Panel } from '../ui/Panel';
import { QueryResult } from '../ui/QueryResult';
import { Table } from '../ui/Table';
import { CopyProfileForm } from './CopyProfileForm';
import { useProfiles, type ListedProfile } from './queries';

const link = 'font-semibold text-slate underline underline-offset-4 hover:text-slate-deep';

function ProfileTable({ caption, rows, editable }: { caption: string; rows: ListedProfile[]; editable: boolean }) {
  const unit = useCurrentSession().user.unit;
  const t = (c: number) => formatTemperature(c, unit);
  return (
    <Table<ListedProfile>
      caption={caption}
      rows={rows}
      rowKey={(p) => p.key}
      columns={[
        { header: 'Name', cell: (p) => (editable ? <Link className={link} to={`/profiles/${p.key}/edit`}>{p.name}</Link> : p.name) },
        { header: 'Key', cell: (p) => p.key + (p.basedOn ? ` (from ${p.basedOn})` : ''), figure: true },
        { header: 'Band', cell: (p) => `${t(p.band.minC)} to ${t(p.band.maxC)}`, figure: true },
        { header: 'Freeze limit', cell: (p) => t(p.freezeC), figure: true },
        { header: 'Callus optimum', cell: (p) => `${t(p.callus.optLowC)} to ${t(p.callus.optHighC)}, ${p.callus.hoursAtOptimum} h`, figure: true },
        { header: 'Batches', cell: (p) => p.batchCount, figure: true },
      ]}
    />
  );
}

/** The built-in profiles with their sources, and the nursery's own edited copies. */
export function ProfilesPage() {
  const profiles = useProfiles();
  const isOwner = useRoleAtLeast('owner');
  return (
    <>
      <PageHeader
        title="Species profiles"
        description="The temperature band, freeze limit and callus curve each batch is measured against. Built-in profiles cite their sources; copy one to set your own numbers."
      />
      <QueryResult query={profiles} loading="Loading species profiles…" failed="Could not load the species profiles">
        {(list) => {
          const own = list.filter((p) => p.origin === 'nursery');
          return (
            <div className="flex flex-col gap-6">
              <Panel title="This nursery's profiles" description={isOwner ? 'Only owners change profiles; every batch using one is recomputed.' : 'Set by the nursery\'s owner.'}>
                {own.length ? <ProfileTable caption="This nursery's profiles" rows={own} editable={isOwner} /> : <p>None yet: every batch uses a built-in profile.</p>}
              </Panel>
              {isOwner && (
                <Panel title="Copy a profile">
                  <CopyProfileForm profiles={list} />
                </Panel>
              )}
              <Panel title="Built-in profiles" description="Read-only. Each number's source is shown when you copy and edit a profile.">
                <ProfileTable caption="Built-in profiles" rows={list.filter((p) => p.origin === 'built-in')} editable={false} />
              </Panel>
            </div>
          );
        }}
      </QueryResult>
    </>
  );
}
