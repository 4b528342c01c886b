import { useRoleAtLeast } from '../auth/useCurrentSession';
import { PageHeader } from '../ui/PageHeader';
import { InvitationSettings } from './InvitationSettings';
import { NurserySettings } from './NurserySettings';
import { PeopleSettings } from './PeopleSettings';
import { TokenSettings } from './TokenSettings';

export function SettingsPage() {
  const isOwner = useRoleAtLeast('owner');
  return (
    <>
      <PageHeader title="Settings" description={isOwner ? 'The nursery, the people in it and the tokens for imports.' : 'The nursery you belong to.'} />
      <div className="flex flex-col gap-6">
        <NurserySettings />
        {isOwner && (
          <>
            <PeopleSettings />
            <InvitationSettings />
            <TokenSettings />
          </>
        )}
      </div>
    </>
  );
}
