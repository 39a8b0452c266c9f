import { expect, test } from '@playwright/test';
import { signIn, signInAndWait, unique } from './helpers';

const FIRST_TEAM = 'Cormorant — keto-diol side chain';
const SECOND_TEAM = 'Heron — hydroxy lactone core';

for (const role of ['lead', 'chemist', 'reviewer', 'viewer']) {
	test(`the demo ${role} signs in and sees the team's projects`, async ({ page }) => {
		await signInAndWait(page, `${role}@example.com`);
		await expect(page.getByRole('link', { name: new RegExp(FIRST_TEAM) })).toBeVisible();
		await expect(page.getByText(SECOND_TEAM)).toHaveCount(0);
		await expect(page.getByTestId('signed-in-as')).not.toBeEmpty();
	});
}

test('a wrong password shows a clear message and no session', async ({ page }) => {
	await signIn(page, 'lead@example.com', 'not-the-password');
	await expect(page.getByRole('alert')).toHaveText(
		'That e-mail and password do not match an Orthogon account.'
	);
	await page.goto('/projects');
	await expect(page).toHaveURL(/\/signin\?redirectTo=%2Fprojects/);
});

test('the outsider never sees the first team’s project, not even by its address', async ({
	page,
	browser
}) => {
	const leadPage = await (await browser.newContext()).newPage();
	await signInAndWait(leadPage, 'lead@example.com');
	const href = await leadPage
		.getByRole('link', { name: new RegExp(FIRST_TEAM) })
		.getAttribute('href');
	expect(href).toMatch(/^\/projects\/[0-9a-f-]{36}$/);

	await signInAndWait(page, 'outsider@example.com');
	await expect(page.getByRole('link', { name: new RegExp(SECOND_TEAM) })).toBeVisible();
	await expect(page.getByText(FIRST_TEAM)).toHaveCount(0);
	const response = await page.goto(href!);
	expect(response?.status()).toBe(404);
	await expect(page.getByText(FIRST_TEAM)).toHaveCount(0);
	const api = await page.request.get('/api/projects');
	expect((await api.json()).projects.map((p: { name: string }) => p.name)).toEqual([SECOND_TEAM]);
});

test('sign-out ends the session', async ({ page }) => {
	await signInAndWait(page, 'viewer@example.com');
	await page.getByRole('button', { name: 'Sign out' }).click();
	await expect(page.getByRole('heading', { name: 'Sign in' })).toBeVisible();
	await page.goto('/projects');
	await expect(page).toHaveURL(/\/signin/);
});

test('sign-out ends the session on the server: a copy of the old cookie is refused', async ({
	page,
	playwright,
	baseURL
}) => {
	await signInAndWait(page, 'viewer@example.com');
	const cookie = (await page.context().cookies()).map((c) => `${c.name}=${c.value}`).join('; ');
	const copy = await playwright.request.newContext({ baseURL, extraHTTPHeaders: { cookie } });
	expect((await copy.get('/api/projects')).status()).toBe(200);
	await page.getByRole('button', { name: 'Sign out' }).click();
	await expect(page.getByRole('heading', { name: 'Sign in' })).toBeVisible();
	expect((await copy.get('/api/projects')).status()).toBe(401);
	await copy.dispose();
});

test('a sign-out posted as text/plain is refused with 415 and a sentence; the form still signs out', async ({
	page,
	baseURL
}) => {
	await signInAndWait(page, 'viewer@example.com');
	const response = await page.request.post('/signout', {
		headers: { 'content-type': 'text/plain', origin: new URL(baseURL!).origin },
		data: 'anything',
		maxRedirects: 0
	});
	// Issue 10, defect 10: a body no form sends is a client error (415), not a 500, and a refused
	// request changes nothing, so the session lasts until the real sign-out form is used.
	expect(response.status()).toBe(415);
	expect(await response.text()).toContain('Forms send');
	expect((await page.request.get('/api/projects')).status()).toBe(200);
	await page.goto('/projects');
	await page.getByRole('button', { name: 'Sign out' }).click();
	await expect(page.getByRole('heading', { name: 'Sign in' })).toBeVisible();
	expect((await page.request.get('/api/projects')).status()).toBe(401);
});

test('redirectTo after sign-in never leaves the site and never breaks the page', async ({
	page,
	baseURL
}) => {
	await signInAndWait(page, 'viewer@example.com');
	for (const target of [
		'/%09/evil.example',
		'%0a',
		'/%0a/evil.example',
		'//evil.example',
		'/%5Cevil.example',
		'https://evil.example'
	]) {
		const response = await page.goto(`/signin?redirectTo=${target}`);
		expect(response?.status(), target).toBe(200);
		expect(new URL(page.url()).origin, target).toBe(new URL(baseURL!).origin);
	}
	await page.goto(`/signin?redirectTo=${encodeURIComponent('/projects?x=1')}`);
	await expect(page).toHaveURL(/\/projects\?x=1$/);
});

test('after a sign-in the chemist lands where they were going', async ({ page }) => {
	await page.goto('/account');
	await expect(page).toHaveURL(/redirectTo=%2Faccount/);
	await page.getByLabel('E-mail').fill('chemist@example.com');
	await page.getByLabel('Password', { exact: true }).fill('orthogon-demo');
	await page.getByRole('button', { name: 'Sign in' }).click();
	await expect(page.getByRole('heading', { name: 'Your account' })).toBeVisible();
});

test('repeated wrong passwords are refused with 429 and Retry-After', async ({
	request,
	page,
	baseURL
}) => {
	const email = 'no-such-person@example.com';
	const attempt = () =>
		request.post('/auth/callback/credentials', {
			form: { email, password: 'guess' },
			headers: { origin: new URL(baseURL!).origin },
			maxRedirects: 0
		});
	const statuses = [];
	for (let i = 0; i < 5; i++) {
		statuses.push((await attempt()).status());
	}
	expect(statuses).not.toContain(429);
	const refused = await attempt();
	expect(refused.status()).toBe(429);
	expect(Number(refused.headers()['retry-after'])).toBeGreaterThan(0);

	// The sign-in page shares the same count and says so in words.
	await signIn(page, email, 'guess');
	await expect(page.getByRole('alert')).toContainText(
		'Too many sign-in attempts. Try again in 15 minutes.'
	);
});

for (const path of ['/auth/callback/credentials/', '/auth/callback//credentials']) {
	test(`guesses posted to ${path} are limited like any other`, async ({ request, baseURL }) => {
		const email = `${unique('guesser').replace(/\W/g, '')}@example.com`;
		const attempt = () =>
			request.post(path, {
				form: { email, password: 'guess' },
				headers: { origin: new URL(baseURL!).origin },
				maxRedirects: 0
			});
		for (let i = 0; i < 5; i++) {
			expect((await attempt()).status()).not.toBe(429);
		}
		const refused = await attempt();
		expect(refused.status()).toBe(429);
		expect(Number(refused.headers()['retry-after'])).toBeGreaterThan(0);
		expect((await refused.json()).error.code).toBe('rate_limited');
	});
}

test('successful scripted sign-ins do not count against the limit', async ({
	request,
	baseURL
}) => {
	const origin = new URL(baseURL!).origin;
	for (let i = 0; i < 8; i++) {
		const response = await request.post('/auth/callback/credentials', {
			form: { email: 'reviewer@example.com', password: 'orthogon-demo' },
			headers: { origin },
			maxRedirects: 0
		});
		expect(response.status()).toBe(302);
		expect(response.headers()['location']).not.toContain('error=');
	}
});

test('pages run under the content security policy without console errors', async ({ page }) => {
	const problems: string[] = [];
	page.on('console', (message) => {
		if (message.type() === 'error') {
			problems.push(message.text());
		}
	});
	page.on('pageerror', (error) => problems.push(error.message));
	await signInAndWait(page, 'lead@example.com');
	await page.getByRole('link', { name: /Cormorant/ }).click();
	await expect(page.getByRole('heading', { name: /Cormorant/, level: 1 })).toBeVisible();
	await page.getByRole('link', { name: 'Aster Process Chemistry' }).click();
	await expect(page.getByRole('heading', { name: 'Add a member' })).toBeVisible();
	await page.getByRole('link', { name: 'Account' }).click();
	await expect(page.getByRole('heading', { name: 'API tokens' })).toBeVisible();
	const response = await page.request.get('/projects');
	expect(response.headers()['content-security-policy']).toContain("frame-ancestors 'none'");
	expect(problems).toEqual([]);
});
