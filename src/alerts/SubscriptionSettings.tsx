import { useState } from 'react';
import { ALERT_RULES, RULE_TITLES } from '../../shared/alerts/rules';
import type { SubscriptionLevel, SubscriptionTopic } from '../../shared/schemas/alerts';
import { Field, Select } from '../ui/Field';
import { FormActions } from '../ui/FormActions';
import { Panel } from '../ui/Panel';
import { QueryResult } from '../ui/QueryResult';
import { usePatchSubscriptions, useSubscriptions, type Subscriptions } from './queries';

const LEVEL_LABEL: Record<SubscriptionLevel, string> = { all: 'Every alert', critical: 'Only "act now"', off: 'None' };

function SubscriptionForm({ current }: { current: Subscriptions }) {
  const save = usePatchSubscriptions();
  const [levels, setLevels] = useState(current.levels);
  const changed = Object.fromEntries(Object.entries(levels).filter(([topic, level]) => current.levels[topic as SubscriptionTopic] !== level));
  const set = (topic: SubscriptionTopic) => (level: string) => setLevels({ ...levels, [topic]: level as SubscriptionLevel });
  return (
    <form
      noValidate
      className="flex flex-col gap-4"
      onSubmit={(e) => {
        e.preventDefault();
        save.mutate(changed);
      }}
    >
      <div className="grid gap-4 sm:grid-cols-2">
        {ALERT_RULES.map((rule) => (
          <Field key={rule} label={RULE_TITLES[rule]} hint={`Default for your role: ${LEVEL_LABEL[current.defaults[rule]].toLowerCase()}.`}>
            {(c) => (
              <Select {...c} value={levels[rule]} onChange={(e) => set(rule)(e.target.value)}>
                {(['all', 'critical', 'off'] as const).map((level) => (
                  <option key={level} value={level}>
                    {LEVEL_LABEL[level]}
                  </option>
                ))}
              </Select>
            )}
          </Field>
        ))}
        <Field label="Daily digest" hint="Each morning: every room's last 24 hours, the open alerts, batches nearly callused.">
          {(c) => (
            <Select {...c} value={levels.daily_digest} onChange={(e) => set('daily_digest')(e.target.value)}>
              <option value="all">Send it</option>
              <option value="off">No digest</option>
            </Select>
          )}
        </Field>
      </div>
      <FormActions submitLabel="Save what I receive" busyLabel="Saving…" busy={save.isPending} error={save.error} success={save.isSuccess && !Object.keys(changed).length && 'Saved.'} />
    </form>
  );
}

/** Each person chooses for themselves which alerts reach their inbox. */
export function SubscriptionSettings() {
  const subscriptions = useSubscriptions();
  return (
    <Panel title="What you receive by e-mail" description="Alerts found together arrive in one message; reminders stop once someone acknowledges.">
      <QueryResult query={subscriptions} loading="Loading your choices…" failed="Could not load your choices">
        {(s) => <SubscriptionForm current={s} />}
      </QueryResult>
    </Panel>
  );
}
