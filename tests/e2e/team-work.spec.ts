import { expect, test } from '@playwright/test';
import { signInAndWait } from './helpers';

test('a chemist creates, renames and archives a project', async ({ page }) => {
	await signInAndWait(page, 'chemist@example.com');
	await page.getByLabel('Name').fill('Gannet — fictional amine fragment');
	await page.getByLabel('Target').fill('A fictional secondary amine carried as its Boc carbamate.');
	await page.getByRole('button', { name: 'Create project' }).click();
	await expect(
		page.getByRole('heading', { name: 'Gannet — fictional amine fragment' })
	).toBeVisible();

	await page.getByRole('button', { name: 'Rename or edit target' }).click();
	await page.getByLabel('Name').fill('Gannet II — fictional amine fragment');
	await page.getByRole('button', { name: 'Save' }).click();
	await expect(
		page.getByRole('heading', { name: 'Gannet II — fictional amine fragment' })
	).toBeVisible();
	await expect(page.getByText('renamed “Gannet — fictional amine fragment”')).toBeVisible();

	await page.getByRole('button', { name: 'Archive' }).click();
	await expect(page.getByText('This project is archived.')).toBeVisible();
	await page.goto('/projects');
	await expect(page.getByText('Gannet II')).toHaveCount(0);
	await page.getByRole('link', { name: 'Show archived' }).click();
	await expect(page.getByText('Gannet II')).toBeVisible();
});

test('a reviewer and a viewer cannot create or edit projects', async ({ browser }) => {
	for (const who of ['reviewer', 'viewer']) {
		const page = await (await browser.newContext()).newPage();
		await signInAndWait(page, `${who}@example.com`);
		await expect(page.getByRole('button', { name: 'Create project' })).toHaveCount(0);
		await page.getByRole('link', { name: /Cormorant/ }).click();
		await expect(page.getByRole('heading', { name: /Cormorant/, level: 1 })).toBeVisible();
		await expect(page.getByRole('button', { name: 'Archive' })).toHaveCount(0);
		await expect(page.getByRole('button', { name: 'Rename or edit target' })).toHaveCount(0);

		const teamId = await page.evaluate(
			async () => (await (await fetch('/api/projects')).json()).projects[0].teamId
		);
		const refused = await page.request.post('/api/projects', {
			data: { name: 'Not allowed', teamId }
		});
		expect(refused.status()).toBe(403);
		expect((await refused.json()).error.code).toBe('forbidden');
		await page.context().close();
	}
});

test('a lead adds a member, who sets a password with the one-time link and signs in', async ({
	page,
	browser
}) => {
	await signInAndWait(page, 'lead@example.com');
	await page.getByRole('link', { name: 'Aster Process Chemistry' }).click();
	await page.getByLabel('E-mail').fill('new.reviewer@example.com');
	await page.getByLabel('Name').fill('Noor Ashby');
	await page.getByLabel('Role', { exact: true }).selectOption('reviewer');
	await page.getByRole('button', { name: 'Add member' }).click();
	const link = await page.getByTestId('set-password-link').inputValue();
	expect(link).toMatch(/\/set-password\/osp_/);
	await expect(page.getByTestId('member-row').filter({ hasText: 'Noor Ashby' })).toBeVisible();

	const newcomer = await (await browser.newContext()).newPage();
	await newcomer.goto(link);
	await newcomer.getByLabel('Password', { exact: true }).fill('noor-chooses-this');
	await newcomer.getByLabel('Password again').fill('noor-chooses-this');
	await newcomer.getByRole('button', { name: 'Set password' }).click();
	await expect(newcomer.getByText('Your password is set.')).toBeVisible();
	await signInAndWait(newcomer, 'new.reviewer@example.com', 'noor-chooses-this');
	await expect(newcomer.getByRole('link', { name: /Cormorant/ })).toBeVisible();

	await newcomer.goto(link);
	await expect(newcomer.getByRole('heading', { name: 'This link no longer works' })).toBeVisible();
});

test('the only lead cannot be removed', async ({ page }) => {
	await signInAndWait(page, 'outsider@example.com');
	await page.getByRole('link', { name: 'Fenwick Analogue Group' }).click();
	page.once('dialog', (dialog) => dialog.accept());
	await page.getByRole('button', { name: 'Remove Sam Outhwaite' }).click();
	await expect(page.getByRole('alert')).toContainText('only lead');
});

test('an API token is shown once, works as a Bearer token, and stops working when revoked', async ({
	page,
	playwright
}) => {
	await signInAndWait(page, 'chemist@example.com');
	await page.getByRole('link', { name: 'Account' }).click();
	await page.getByLabel('Label').fill('route export script');
	await page.getByRole('button', { name: 'Create token' }).click();
	const token = await page.getByTestId('new-token').inputValue();
	expect(token).toMatch(/^ogt_/);

	const api = await playwright.request.newContext({ baseURL: page.url() });
	const listed = await api.get('/api/projects', { headers: { authorization: `Bearer ${token}` } });
	expect(listed.status()).toBe(200);
	expect((await listed.json()).projects.length).toBeGreaterThan(0);

	await page.reload();
	await expect(page.getByTestId('new-token')).toHaveCount(0);
	await page.getByRole('button', { name: 'Revoke route export script' }).click();
	await expect(page.getByTestId('token-row')).toHaveCount(0);
	const after = await api.get('/api/projects', { headers: { authorization: `Bearer ${token}` } });
	expect(after.status()).toBe(401);
	expect((await after.json()).error.code).toBe('invalid_token');
	await api.dispose();
});

test('pages and the API refuse visitors without a session', async ({ page, request }) => {
	const api = await request.get('/api/projects');
	expect(api.status()).toBe(401);
	expect(await api.json()).toEqual({
		error: { code: 'unauthenticated', message: expect.any(String) }
	});
	await page.goto('/teams/00000000-0000-4000-8000-000000000000');
	await expect(page).toHaveURL(/\/signin\?redirectTo=/);
});
