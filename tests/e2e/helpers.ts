import { expect, type Browser, type Page } from '@playwright/test';

export const DEMO_PASSWORD = 'orthogon-demo';

// The invented Cormorant scenario: a fictional keto ester (OG-2031-A) meets a Grignard reagent.
export const PROJECT = /Cormorant/;
export const KETO_ESTER = 'CC(=O)CCC(=O)OC';
// The product the chemist wants: the ester becomes a tertiary alcohol and the ketone stays.
export const HYDROXY_KETONE = 'CC(=O)CCC(C)(C)O';

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

/** A name no other test run uses, e.g. 'Grignard first lx3k2f1234'. */
export const unique = (what: string) =>
	`${what} ${Date.now().toString(36)}${Math.floor(Math.random() * 1e4)}`;

/** A second signed-in person in their own browser context. */
export async function asUser(browser: Browser, who: string): Promise<Page> {
	const page = await (await browser.newContext()).newPage();
	await signInAndWait(page, `${who}@example.com`);
	return page;
}

export async function cormorantId(page: Page): Promise<string> {
	const projects: { id: string; name: string }[] = (
		await (await page.request.get('/api/projects')).json()
	).projects;
	return projects.find((p) => PROJECT.test(p.name))!.id;
}

type Node = { label: string; structure: string };

/**
 * A route of one step, `from` → `to`, made in Cormorant through the API; returns its id, e.g.
 * `oneStepRoute(page, { name, from: { label: 'diol', structure: 'OCCCCO' }, to, reagents: 'TBSCl' })`.
 */
export async function oneStepRoute(
	page: Page,
	route: { name: string; from: Node; to: Node; reagents: string; intent?: 'protect' | 'deprotect' }
): Promise<string> {
	const { name, from, to, reagents, intent } = route;
	const created = await page.request.post(`/api/projects/${await cormorantId(page)}/routes`, {
		data: {
			name,
			intermediates: [
				{ id: 'a', ...from, position: { x: 0, y: 0 } },
				{ id: 'b', ...to, position: { x: 380, y: 0 } }
			],
			steps: [{ id: 's1', from: ['a'], to: 'b', reagents, ...(intent ? { intent } : {}) }]
		}
	});
	expect(created.status()).toBe(201);
	return (await created.json()).id;
}

/** A two-node route made through the API, for the tests that are about something else. */
export function makeRoute(page: Page, name: string, reagents = 'MeMgBr, THF'): Promise<string> {
	return oneStepRoute(page, {
		name,
		from: { label: 'OG-2031-A keto ester', structure: KETO_ESTER },
		to: { label: 'OG-2031-C hydroxy ketone', structure: HYDROXY_KETONE },
		reagents
	});
}
