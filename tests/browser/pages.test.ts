import request from 'supertest';
import { describe, expect, it } from 'vitest';
import { openAccountMenu, signInWithForm, signOut } from './support/actions';
import { useBrowserSuite } from './support/browserApp';
import { heading, openPage, recordPage, sectionNav, visible, WIDTHS } from './support/browser';

const suite = useBrowserSuite();

describe.each(WIDTHS)('the remaining pages at %i px wide', (width) => {

  it('creates a new nursery, whose time zone defaults to the browser zone, and signs its owner in', async () => {
    const t = suite.app();
    const { page, problems } = await openPage(suite.browser(), width);
    await page.goto(`${t.origin}/sign-in`);
    await page.getByRole('link', { name: 'Create an account' }).click();
    await visible(heading(page, 'Create a nursery'));
    // The browser runs in Asia/Tokyo (see launchBrowser).
    expect(await page.getByLabel('Time zone').inputValue()).toBe('Asia/Tokyo');
    await page.getByLabel('Time zone').fill('Atlantis/Lost');
    await page.getByRole('button', { name: 'Create nursery' }).click();
    await visible(page.getByText('Not a known IANA time zone'));
    await page.getByLabel('Time zone').fill('Europe/Berlin');
    await page.getByLabel('Nursery name').fill(`Quillmere Grafts ${width}`);
    await page.getByLabel('Your name').fill('Odile Brant');
    await page.getByLabel('E-mail').fill(`odile.${width}@example.com`);
    await page.getByLabel('Password', { exact: true }).fill('long enough passphrase');
    await recordPage(page, 'sign-up');
    await page.getByRole('button', { name: 'Create nursery' }).click();
    await visible(heading(page, 'Overview'));
    await visible(page.getByText('No rooms yet'));
    await visible(page.getByRole('banner').getByText(`Quillmere Grafts ${width}`, { exact: true }));
    await recordPage(page, 'rooms-empty');
    await signOut(page);
    expect(problems).toEqual([]);
    await page.close();
  });

  it('switches the temperature unit, changes the password and shows a 404 inside the frame', async () => {
    const t = suite.app();
    const { page, problems } = await openPage(suite.browser(), width);
    // A person of their own for each width, since the password changes here.
    const email = `hollis.${width}@example.com`;
    const signup = await request(t.app)
      .post('/api/auth/signup')
      .send({ nurseryName: `Larchgate ${width}`, name: 'Hollis Penn', email, password: 'coldknit-demo', timeZone: 'America/Chicago' });
    expect(signup.status).toBe(201);
    await signInWithForm(page, t.origin, email);
    await openAccountMenu(page);
    await page.getByRole('radio', { name: '°F' }).check();
    await page.getByRole('link', { name: 'Change password' }).click();
    await visible(heading(page, 'Your account'));
    expect(await page.getByRole('radio', { name: '°F' }).isChecked()).toBe(true);
    await page.getByLabel('Current password').fill('coldknit-demo');
    await page.getByLabel('New password').fill('frost on the cellar door');
    await recordPage(page, 'account');
    await page.getByRole('button', { name: 'Change password' }).click();
    await visible(page.getByText('Password changed.'));

    await page.goto(`${t.origin}/nowhere/at/all`);
    await visible(heading(page, 'No such page'));
    await recordPage(page, 'not-found');
    await page.goto(`${t.origin}/rooms/abc`);
    await visible(heading(page, 'No such room'));

    await signOut(page);
    await signInWithForm(page, t.origin, email, 'frost on the cellar door');
    await openAccountMenu(page);
    // The unit is stored with the person, so it survives signing out and in.
    expect(await page.getByRole('radio', { name: '°F' }).isChecked()).toBe(true);
    expect(problems).toEqual([]);
    await page.close();
  });

  it('is usable from the keyboard: skip link, account menu, focus back on Escape', async () => {
    const t = suite.app();
    const { page, problems } = await openPage(suite.browser(), width);
    await signInWithForm(page, t.origin, 'viewer@example.com');
    await page.goto(`${t.origin}/loggers`);
    await visible(heading(page, 'Loggers'));
    await page.keyboard.press('Tab');
    const skip = page.getByRole('link', { name: 'Skip to content' });
    await visible(skip);
    expect(await skip.evaluate((el) => el === document.activeElement)).toBe(true);
    await page.keyboard.press('Enter');
    expect(await page.evaluate(() => document.activeElement?.id)).toBe('main');

    const menuButton = page.getByRole('button', { name: /account menu/ });
    await menuButton.focus();
    await page.keyboard.press('Enter');
    expect(await menuButton.getAttribute('aria-expanded')).toBe('true');
    await visible(page.getByRole('button', { name: 'Sign out' }));
    await page.keyboard.press('Escape');
    expect(await menuButton.getAttribute('aria-expanded')).toBe('false');
    expect(await menuButton.evaluate((el) => el === document.activeElement)).toBe(true);
    expect(await page.getByRole('button', { name: 'Sign out' }).isVisible()).toBe(false);

    // Following a section link moves focus to the new page's content, as a full page load would.
    await sectionNav(page).getByRole('link', { name: 'Rooms' }).press('Enter');
    await visible(heading(page, 'Rooms'));
    await page.waitForFunction(() => document.activeElement?.id === 'main');
    expect(problems).toEqual([]);
    await page.close();
  });
});
