import type { Page } from 'playwright-core';
import { goToSection, heading, visible } from './browser';

/** Signs in through the form, the way a person does, lands on the overview, and goes on to the rooms list. */
export async function signInWithForm(page: Page, origin: string, email: string, password = 'coldknit-demo'): Promise<void> {
  await page.goto(`${origin}/sign-in`);
  await visible(heading(page, 'Sign in'));
  await page.getByLabel('E-mail').fill(email);
  await page.getByLabel('Password', { exact: true }).fill(password);
  await page.getByRole('button', { name: 'Sign in', exact: true }).click();
  await visible(heading(page, 'Overview'));
  await goToSection(page, 'Rooms');
  await visible(heading(page, 'Rooms'));
}

export async function openAccountMenu(page: Page): Promise<void> {
  await page.getByRole('button', { name: /account menu/ }).click();
  await visible(page.getByRole('button', { name: 'Sign out' }));
}

export async function signOut(page: Page): Promise<void> {
  await openAccountMenu(page);
  await page.getByRole('button', { name: 'Sign out' }).click();
  await visible(heading(page, 'Sign in'));
}
