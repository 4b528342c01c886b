import { Alert } from './alert.model';
import { AlertDigest } from './alertDigest.model';
import { AlertRecipient } from './alertRecipient.model';
import { AlertSetting } from './alertSetting.model';
import { AlertSubscription } from './alertSubscription.model';
import { OutboxMessage } from './outboxMessage.model';

/** The alerting models, bound by server/db/models.ts with the rest. */
export const ALERT_MODELS = [Alert, AlertRecipient, AlertSetting, AlertSubscription, OutboxMessage, AlertDigest];
