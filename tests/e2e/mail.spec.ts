import { expect, test } from '@playwright/test';
import { asUser, signInAndWait } from './helpers';

test('a lead finds the Outbox in the header, with the local mail catcher’s section', async ({
	page
}) => {
	await signInAndWait(page, 'lead@example.com');
	await page
		.getByRole('navigation', { name: 'Main' })
		.getByRole('link', { name: 'Outbox' })
		.click();
	await expect(page.getByRole('heading', { name: 'Outbox', level: 1 })).toBeVisible();
	await expect(page.getByRole('table', { name: /Mails Orthogon sends/ })).toBeVisible();
	// The e2e server runs without SMTP_URL, so its mail goes to the local catcher.
	await expect(
		page.getByRole('heading', { name: 'Received by the local mail catcher' })
	).toBeVisible();
});

test('a chemist has no Outbox link and gets 403 at its address', async ({ browser }) => {
	const page = await asUser(browser, 'chemist');
	await expect(
		page.getByRole('navigation', { name: 'Main' }).getByRole('link', { name: 'Outbox' })
	).toHaveCount(0);
	const response = await page.goto('/outbox');
	expect(response?.status()).toBe(403);
	await expect(
		page.getByRole('heading', { name: 'Only a team lead can read the outbox.' })
	).toBeVisible();
	expect((await page.request.get('/api/outbox')).status()).toBe(403);
});

test('a reviewer turns comment mails off on the Account page, and it stays off', async ({
	browser
}) => {
	const page = await asUser(browser, 'reviewer');
	await page.goto('/account');
	const choice = page.getByLabel('Mail me about comments');
	await expect(choice).toBeChecked();
	await choice.uncheck();
	await page.getByRole('button', { name: 'Save mail choices' }).click();
	await expect(page.getByText('Saved: comment mails are off.')).toBeVisible();
	await page.reload();
	await expect(page.getByLabel('Mail me about comments')).not.toBeChecked();
	// Back on, so a rerun against the same server starts from the default.
	await page.getByLabel('Mail me about comments').check();
	await page.getByRole('button', { name: 'Save mail choices' }).click();
	await expect(page.getByText('Saved: comment mails are on.')).toBeVisible();
});
