import { resolve } from 'node:path';
import { describe, expect, it } from 'vitest';
import { signInWithForm } from './support/actions';
import { useBrowserSuite } from './support/browserApp';
import { goToSection, heading, openPage, recordPage, visible, WIDTHS } from './support/browser';

const suite = useBrowserSuite();

/** The daily round of the dashboard: overview, a room's chart, a batch moved, a logger file brought in, alerts and the season. */
describe.each(WIDTHS)('the dashboard at %i px wide', (width) => {
  it('shows the overview and a room chart, moves a batch, imports a file, and opens alerts and the season report', async () => {
    const t = suite.app();
    const { page, problems } = await openPage(suite.browser(), width);
    await signInWithForm(page, t.origin, 'staff@example.com');

    await goToSection(page, 'Overview');
    await visible(heading(page, 'Overview'));
    await visible(page.getByRole('heading', { name: 'North garage' }));
    await recordPage(page, 'overview');

    await goToSection(page, 'Rooms');
    await page.getByRole('link', { name: 'North garage' }).click();
    await visible(heading(page, 'North garage'));
    await visible(page.getByRole('img', { name: /temperature/i }));
    await page.getByText('30 days', { exact: true }).click();
    await recordPage(page, 'room-chart');

    await goToSection(page, 'Batches');
    await visible(heading(page, 'Batches'));
    await recordPage(page, 'batches');
    const code = (await page.getByRole('row').filter({ hasText: 'In storage' }).filter({ hasText: 'Root cellar' }).first().getByRole('link').first().textContent())!.trim();
    await page.getByRole('link', { name: code, exact: true }).click();
    await visible(heading(page, new RegExp(code)));
    await visible(page.getByRole('heading', { name: 'Exposure in storage' }));
    await page.getByLabel('Move to').selectOption({ label: 'North garage' });
    await page.getByRole('button', { name: 'Record move' }).click();
    await visible(page.getByRole('main').getByRole('cell', { name: 'North garage' }).first());
    await recordPage(page, 'batch-moved');

    await goToSection(page, 'Imports');
    await visible(heading(page, 'Imports'));
    await page.getByLabel('Choose files…').setInputFiles(resolve('samples/north-garage-tab-preamble.txt'));
    await visible(page.getByText('First rows as read'));
    await page.getByText('Change what was detected').click();
    await page.getByRole('combobox', { name: 'Logger' }).selectOption({ label: 'K-03 (BF-2219-003)' });
    await page.getByRole('button', { name: /^Import [\d,]+ readings$/ }).click();
    // Both widths share one app: the second time round the same file is recognised and stores nothing.
    await visible(page.getByText(/^(Imported into K-03\.|This exact file was imported before)/));
    await recordPage(page, 'import-done');

    await goToSection(page, 'Alerts');
    await visible(heading(page, 'Alerts'));
    await recordPage(page, 'alerts');

    await goToSection(page, 'Season');
    await visible(page.getByRole('heading', { level: 1 }));
    await recordPage(page, 'season');

    expect(problems).toEqual([]);
    await page.close();
  });
});
