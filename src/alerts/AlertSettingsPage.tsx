import { PageHeader } from '../ui/PageHeader';
import { SubscriptionSettings } from './SubscriptionSettings';
import { ThresholdSettings } from './ThresholdSettings';

export function AlertSettingsPage() {
  return (
    <>
      <PageHeader title="Alert settings" description="What you hear about, and when the rules speak up." back={{ to: '/alerts', label: 'Alerts' }} />
      <div className="flex flex-col gap-6">
        <SubscriptionSettings />
        <ThresholdSettings />
      </div>
    </>
  );
}
