import { describe, expect, it } from 'vitest';
import { signInWithForm } from './support/actions';
import { useBrowserSuite } from './support/browserApp';
import { goToSection, heading, openPage, recordPage, visible, WIDTHS } from './support/browser';

/** Labels of every control that changes data; a viewer must meet none of them (the server refuses them anyway). */
const WRITE_CONTROLS = /^(Add room|Add logger|Add a logger here|Edit|Delete|Record move|Send invitation|Create token|Save nursery|Remove|Revoke)$/;

const suite = useBrowserSuite();

describe.each(WIDTHS)('a viewer at %i px wide', (width) => {

  it('reads rooms, loggers and settings without meeting a single write control', async () => {
    const t = suite.app();
    const { page, problems } = await openPage(suite.browser(), width);
    await signInWithForm(page, t.origin, 'viewer@example.com');
    const writeControls = () => page.getByRole('main').getByRole('link').or(page.getByRole('main').getByRole('button')).filter({ hasText: WRITE_CONTROLS });

    await visible(page.getByRole('link', { name: 'North garage' }));
    expect(await writeControls().count()).toBe(0);

    await page.getByRole('link', { name: 'North garage' }).click();
    await visible(heading(page, 'North garage'));
    await visible(page.getByRole('link', { name: 'K-02' }));
    expect(await writeControls().count()).toBe(0);
    await recordPage(page, 'viewer-room-detail');

    await page.getByRole('link', { name: 'K-02' }).click();
    await visible(heading(page, 'K-02'));
    await visible(page.getByRole('heading', { name: 'Placement history' }));
    expect(await page.getByRole('heading', { name: 'Move' }).count()).toBe(0);
    expect(await writeControls().count()).toBe(0);
    await recordPage(page, 'viewer-logger-detail');

    await goToSection(page, 'Loggers');
    await visible(page.getByRole('link', { name: 'K-05' }));
    expect(await writeControls().count()).toBe(0);

    await goToSection(page, 'Settings');
    await visible(page.getByText('America/Chicago'));
    expect(await page.getByRole('textbox').count()).toBe(0);
    expect(await writeControls().count()).toBe(0);
    await recordPage(page, 'viewer-settings');
    expect(problems).toEqual([]);
    await page.close();
  });
});
