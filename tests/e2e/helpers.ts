import { expect, type Page } from '@playwright/test';

export const DEMO_PASSWORD = 'orthogon-demo';

export async function signIn(page: Page, email: string, password = DEMO_PASSWORD) {
	await page.goto('/signin');
	await page.getByLabel('E-mail').fill(email);
	await page.getByLabel('Password', { exact: true }).fill(password);
	await page.getByRole('button', { name: 'Sign in' }).click();
}

export async function signInAndWait(page: Page, email: string, password = DEMO_PASSWORD) {
	await signIn(page, email, password);
	await expect(page.getByRole('heading', { name: 'Projects', level: 1 })).toBeVisible();
}
