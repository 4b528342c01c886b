import { DateTime } from 'luxon';
import type { OutgoingMail } from '../mail/mailer';
import { escapeHtml } from '../mail/escapeHtml';

export function invitationMail(input: { to: string; nurseryName: string; timeZone: string; inviterName: string; role: string; link: string; expiresAt: Date }): OutgoingMail {
  // On the nursery's clock, the one everybody there reads.
  const until = DateTime.fromJSDate(input.expiresAt, { zone: input.timeZone }).toFormat("cccc d LLLL yyyy, HH:mm ZZZZ");
  const text = [
    `${input.inviterName} has invited you to ${input.nurseryName} on Coldknit as ${input.role}.`,
    '',
    `Choose your password here (the link works once, until ${until}):`,
    input.link,
    '',
    'If you did not expect this, ignore this message and nothing will happen.',
  ].join('\n');
  const html = `<p>${escapeHtml(input.inviterName)} has invited you to <strong>${escapeHtml(input.nurseryName)}</strong> on Coldknit as ${escapeHtml(input.role)}.</p>
<p><a href="${escapeHtml(input.link)}">Choose your password</a> — the link works once, until ${escapeHtml(until)}.</p>
<p>If you did not expect this, ignore this message and nothing will happen.</p>`;
  return { to: input.to, subject: `You're invited to ${input.nurseryName} on Coldknit`, text, html };
}
