import { describe, expect, it } from 'vitest';
import { signIn } from '../support/testApp';
import { openAccountMenu, signInWithForm, signOut } from './support/actions';
import { useBrowserSuite } from './support/browserApp';
import { goToSection, heading, openPage, recordPage, visible, WIDTHS } from './support/browser';

const suite = useBrowserSuite();

describe.each(WIDTHS)('an owner at %i px wide', (width) => {

  it('signs in by picking a demo account, and lands on the overview', async () => {
    const t = suite.app();
    const { page, problems } = await openPage(suite.browser(), width);
    await page.goto(`${t.origin}/`);
    // Signed out, the app sends the visitor to sign-in first.
    await visible(heading(page, 'Sign in'));
    await recordPage(page, 'sign-in');
    await page.getByRole('button', { name: /owner@example\.com/ }).click();
    expect(await page.getByLabel('E-mail').inputValue()).toBe('owner@example.com');
    await page.getByRole('button', { name: 'Sign in', exact: true }).click();
    await visible(heading(page, 'Overview'));
    await visible(page.getByRole('link', { name: 'Root cellar' }).first());
    expect(new URL(page.url()).pathname).toBe('/overview');
    await recordPage(page, 'overview');
    await openAccountMenu(page);
    await recordPage(page, 'account-menu');
    expect(problems).toEqual([]);
    await page.close();
  });

  it('adds a room and a logger, then moves the logger on the nursery clock', async () => {
    const t = suite.app();
    const { page, problems, expect: tolerate } = await openPage(suite.browser(), width);
    await signInWithForm(page, t.origin, 'owner@example.com');
    const room = `Seed shed ${width}`;
    const label = `T-${width}`;

    await page.getByRole('link', { name: 'Add room' }).click();
    await visible(heading(page, 'Add a room'));
    await page.getByRole('button', { name: 'Add room' }).click();
    await visible(page.getByText('Give the room a name'));
    await recordPage(page, 'room-new-errors');
    await page.getByLabel('Name').fill(room);
    await page.getByLabel('Kind').selectOption('cellar');
    await page.getByLabel('Notes').fill('Stone walls; stays near 2 °C through January.');
    await page.getByRole('button', { name: 'Add room' }).click();
    await visible(heading(page, room));
    await visible(page.getByText('No logger in this room'));

    await page.getByRole('link', { name: 'Add a logger here' }).click();
    await visible(heading(page, 'Add a logger'));
    // Arriving from the room preselects it; this logger starts outside every room instead, to be moved with a date.
    expect(await page.getByLabel('Room').inputValue()).not.toBe('');
    await page.getByLabel('Label').fill(label);
    await page.getByLabel('Serial number').fill(`SN-${width}-77`);
    await page.getByLabel('Room').selectOption({ label: 'Not in a room yet' });
    await recordPage(page, 'logger-new');
    await page.getByRole('button', { name: 'Add logger' }).click();
    await visible(heading(page, label));
    await visible(page.getByText('Never placed'));
    const loggerId = Number(new URL(page.url()).pathname.split('/').pop());

    // 08:30 on 20 Nov 2026 in America/Chicago is 14:30 UTC: CST is UTC−6 from the first Sunday of November
    // (IANA tz database, zone America/Chicago). The browser runs in Asia/Tokyo, so browser-local reading would differ.
    await page.getByLabel('Move to').selectOption({ label: room });
    await page.getByLabel('When').fill('2026-11-20T08:30');
    await page.getByRole('button', { name: 'Record move' }).click();
    await visible(page.getByText(`Moved to ${room} on 20 Nov 2026, 08:30.`));
    await visible(page.getByRole('cell', { name: '20 Nov 2026, 08:30' }));

    // A move before the current placement began is refused by the server; its message is shown as it is.
    tolerate({ status: 409, path: `/api/loggers/${loggerId}/move` });
    await page.getByLabel('Move to').selectOption({ label: 'Root cellar' });
    await page.getByLabel('When').fill('2026-11-19T08:30');
    await page.getByRole('button', { name: 'Record move' }).click();
    await visible(page.getByRole('alert').filter({ hasText: 'must come after' }));

    await page.getByLabel('When').fill('');
    await page.getByRole('button', { name: 'Record move' }).click();
    await visible(page.getByText('Moved to Root cellar now.'));
    await visible(page.getByRole('cell', { name: 'still there' }));
    await recordPage(page, 'logger-detail');

    const agent = await signIn(t.app, 'owner@example.com');
    const saved = (await agent.get(`/api/loggers/${loggerId}`)).body as { roomId: number; placements: { from: string; to: string | null }[] };
    expect(saved.placements).toHaveLength(2);
    expect(saved.placements[0].from).toBe('2026-11-20T14:30:00.000Z');
    expect(saved.placements[0].to).toBe(saved.placements[1].from);

    await goToSection(page, 'Rooms');
    await page.getByRole('link', { name: room }).click();
    await visible(page.getByRole('heading', { name: 'Loggers here before' }));
    await recordPage(page, 'room-detail');

    await page.getByRole('link', { name: 'Edit' }).click();
    await visible(heading(page, `Edit ${room}`));
    await page.getByLabel('Notes').fill('Stone walls. The door sticks in a frost.');
    await page.getByRole('button', { name: 'Save changes' }).click();
    await visible(heading(page, room));
    await visible(page.getByText('The door sticks in a frost.'));

    // A room with logger history keeps it: the server refuses the delete and the page says why.
    const roomId = new URL(page.url()).pathname.split('/').pop();
    tolerate({ status: 409, path: `/api/rooms/${roomId}` });
    await page.getByRole('button', { name: 'Delete' }).click();
    await page.getByRole('button', { name: 'Delete room' }).click();
    await visible(page.getByRole('alert').filter({ hasText: 'has logger or batch history' }));
    await page.getByRole('button', { name: 'Keep it' }).click();
    await visible(page.getByRole('button', { name: 'Delete' }));
    await goToSection(page, 'Loggers');
    await visible(heading(page, 'Loggers'));
    await visible(page.getByRole('link', { name: label }));
    await recordPage(page, 'loggers');
    expect(problems).toEqual([]);
    await page.close();
  });

  it('invites a person, who follows the e-mailed link, chooses a password and is signed in', async () => {
    const t = suite.app();
    const { page, problems, expect: tolerate } = await openPage(suite.browser(), width);
    await signInWithForm(page, t.origin, 'owner@example.com');
    const email = `fern.${width}@example.com`;
    await goToSection(page, 'Settings');
    await visible(heading(page, 'Settings'));
    const invitations = page.getByRole('region', { name: 'Invitations' });
    await invitations.getByLabel('E-mail').fill(email);
    await invitations.getByLabel('Role').selectOption('staff');
    await invitations.getByRole('button', { name: 'Send invitation' }).click();
    await visible(invitations.getByText(`Invitation sent to ${email}`));
    await visible(invitations.getByRole('cell', { name: email }));

    const tokens = page.getByRole('region', { name: 'API tokens' });
    await tokens.getByLabel('Token name').fill(`Packing shed PC ${width}`);
    await tokens.getByRole('button', { name: 'Create token' }).click();
    await visible(tokens.getByText('you will not see this token again'));
    const secret = await tokens.getByLabel('New API token').textContent();
    expect(secret).toMatch(/^ckt_/);
    await visible(tokens.getByText(`coldknit login --server ${t.origin}`));
    await recordPage(page, 'settings');
    await tokens.getByRole('button', { name: 'I have saved it' }).click();
    await visible(tokens.getByRole('cell', { name: `Packing shed PC ${width}` }));

    const mail = t.mail.messages.find((m) => m.to.includes(email));
    expect(mail?.subject).toContain('Brackenfold Nursery');
    const link = /https?:\/\/\S+\/invite\/[A-Za-z0-9_-]+/.exec(mail!.text)?.[0];
    expect(link?.startsWith(`${t.origin}/invite/`)).toBe(true);

    await t.publishCapturedMail();
    await openAccountMenu(page);
    await page.getByRole('link', { name: 'Captured mail' }).click();
    await visible(heading(page, 'Captured mail'));
    await page.getByRole('link', { name: new RegExp(`to ${email}`) }).click();
    await visible(page.getByRole('link', { name: link! }));
    await visible(page.frameLocator('iframe').getByText('Choose your password'));
    await recordPage(page, 'captured-mail');

    await page.goto(`${t.origin}/rooms`);
    await signOut(page);
    await page.goto(link!);
    await visible(heading(page, 'Accept invitation'));
    await visible(page.getByText('You have been invited to'));
    expect(await page.getByLabel('E-mail').inputValue()).toBe(email);
    await page.getByLabel('Your name').fill('Fern Idlewild');
    await page.getByLabel('Choose a password').fill('short');
    await page.getByRole('button', { name: /^Join/ }).click();
    await visible(page.getByText('Use at least 10 characters'));
    await page.getByLabel('Choose a password').fill('mossy stones under frost');
    await recordPage(page, 'invite-accept');
    await page.getByRole('button', { name: /^Join/ }).click();
    await visible(heading(page, 'Overview'));
    await visible(page.getByRole('button', { name: /Fern Idlewild/ }));
    // Staff edit rooms but do not manage people.
    await goToSection(page, 'Rooms');
    await visible(page.getByRole('link', { name: 'Add room' }));
    await goToSection(page, 'Settings');
    await visible(page.getByText('Only an owner can change these.'));
    expect(await page.getByRole('region', { name: 'People' }).count()).toBe(0);
    await signOut(page);

    // The link works once.
    tolerate({ status: 410, path: new URL(link!).pathname.replace('/invite/', '/api/invitations/token/') });
    await page.goto(link!);
    await visible(page.getByRole('alert').filter({ hasText: 'used or has expired' }));
    expect(problems).toEqual([]);
    await page.close();
  });
});
