import { expect, test, type Page } from '@playwright/test';
import { asUser, makeRoute, signInAndWait, unique } from './helpers';

// The invented Cormorant scenario: MeMgBr would add to the keto ester's ketone as well as to its
// ester, so the ketone must be masked through the Grignard step, e.g. as a cyclic acetal (Clayden,
// ketones react with Grignard reagents; from memory).

const plansDialog = (page: Page) => page.getByRole('dialog', { name: 'Protection plans' });
const stepLabel = (page: Page, intent: string) =>
	page.locator(`[data-testid="step-label"][data-intent="${intent}"]`);

test('a chemist plans protection, sees the ranked plans, uses plan 1 and lands on the new route with the added steps marked', async ({
	page
}) => {
	await signInAndWait(page, 'chemist@example.com');
	const name = unique('Plan me');
	const id = await makeRoute(page, name, 'THF');
	await page.goto(`/routes/${id}`);
	await expect(page.getByTestId('intermediate-node')).toHaveCount(2);

	// An edit still waiting to be saved is saved before the planner reads the stored route: with
	// only THF nothing attacks the ketone; with MeMgBr it must be masked.
	await page.getByTestId('step-label').getByRole('button', { name: 'THF' }).click();
	await page.getByRole('textbox', { name: 'Reagents and conditions' }).fill('MeMgBr, THF');
	await page.getByRole('button', { name: 'Plan protection' }).click();

	const dialog = plansDialog(page);
	await expect(dialog).toBeVisible();
	const cards = dialog.getByTestId('plan-card');
	await expect(cards.first()).toBeVisible({ timeout: 20_000 });
	expect(await cards.count()).toBeGreaterThan(1);
	await expect(cards.first().getByRole('heading', { name: 'Plan 1' })).toBeVisible();
	await expect(dialog).toContainText('dioxolane');
	const first = cards.first();
	await expect(first).toContainText(/ketone masked as/);
	await expect(first).toContainText('before step 1 (MeMgBr, THF)');
	await expect(first).toContainText('at the end');
	await expect(first).toContainText('2 added steps');
	// The rationale names the ketone and the step that would attack it.
	await expect(first.getByRole('region', { name: 'Why plan 1' })).toContainText('ketone');
	// The first protected intermediate is drawn by the server.
	await expect(first.getByRole('img', { name: /^Protected intermediate with / })).toBeVisible();
	// The reagents the plan adds come with their hazard notes, each deferring to the SDS.
	const care = first.getByRole('region', { name: 'Take care with plan 1' });
	await expect(care).toContainText('Hazards of the added steps');
	await expect(care).toContainText('Check the SDS');
	await expect(page.getByTestId('save-status')).toHaveText('All changes saved');

	await first.getByRole('button', { name: 'Use this plan' }).click();
	await expect(page).not.toHaveURL(new RegExp(id));
	await expect(
		page.getByRole('heading', { name: `${name} (protected, plan 1)`, level: 1 })
	).toBeVisible();
	// The success notice is the app's, not the old route screen's: it outlives the move.
	await expect(
		page
			.getByRole('status')
			.filter({ hasText: `Plan 1 is saved as “${name} (protected, plan 1)”.` })
	).toBeVisible();
	await expect(page.getByTestId('intermediate-node')).toHaveCount(4);

	// The planner's steps are marked on the canvas, in words and for screen readers.
	await expect(stepLabel(page, 'protect')).toHaveCount(1);
	await expect(stepLabel(page, 'protect').getByText('protect', { exact: true })).toBeVisible();
	await expect(stepLabel(page, 'deprotect').getByText('deprotect', { exact: true })).toBeVisible();
	await expect(stepLabel(page, 'transform')).toContainText('MeMgBr, THF');
	await expect(
		page.locator('[aria-roledescription="edge"][aria-label^="Protection step: "]')
	).toHaveCount(1);
	await expect(
		page.locator('[aria-roledescription="edge"][aria-label^="Deprotection step: "]')
	).toHaveCount(1);

	// The new intermediates arrive without a place and are laid out: no two nodes overlap.
	const overlaps = () =>
		page.getByTestId('intermediate-node').evaluateAll((nodes) => {
			const boxes = nodes.map((n) => n.getBoundingClientRect());
			return boxes.flatMap((a, i) =>
				boxes
					.slice(i + 1)
					.filter(
						(b) => a.left < b.right && b.left < a.right && a.top < b.bottom && b.top < a.bottom
					)
			).length;
		});
	await expect.poll(overlaps).toBe(0);

	const back = page.getByTestId('planned-from');
	await expect(back).toContainText('Planned from');
	await back.getByRole('link', { name }).click();
	await expect(page.getByRole('heading', { name, level: 1 })).toBeVisible();
	await expect(page.getByTestId('intermediate-node')).toHaveCount(2);
	await expect(page.getByRole('navigation', { name: 'Planned versions' })).toContainText(
		`${name} (protected, plan 1)`
	);
});

test('a reviewer sees the plans but cannot use one', async ({ page, browser }) => {
	const chemist = await asUser(browser, 'chemist');
	const id = await makeRoute(chemist, unique('Reviewed plan'));
	await chemist.context().close();

	await signInAndWait(page, 'reviewer@example.com');
	await page.goto(`/routes/${id}`);
	await page.getByRole('button', { name: 'Plan protection' }).click();
	const dialog = plansDialog(page);
	await expect(dialog.getByTestId('plan-card').first()).toBeVisible({ timeout: 20_000 });
	await expect(dialog).toContainText('dioxolane');
	await expect(dialog.getByRole('button', { name: 'Use this plan' })).toHaveCount(0);
	await dialog.getByRole('button', { name: 'Close' }).click();
	await expect(dialog).toBeHidden();
	// The server refuses too, whatever the page shows.
	const refused = await page.request.post(`/api/routes/${id}/plan/1/save`, {
		data: { version: 1 }
	});
	expect(refused.status()).toBe(403);
});

test('a route with no possible plan says why instead of showing plans', async ({ page }) => {
	await signInAndWait(page, 'chemist@example.com');
	// The ketone reacts on purpose while the ester must stand by the Grignard reagent, and no
	// protecting group masks an ester (Clayden, esters react with Grignard reagents; from memory).
	const id = await makeRoute(page, unique('No plan'));
	const doc = await (await page.request.get(`/api/routes/${id}`)).json();
	const kept = {
		...doc.document,
		// The product node (makeRoute's second intermediate) becomes the hydroxy ester.
		intermediates: doc.document.intermediates.map((n: { id: string }, i: number) =>
			i === 1 ? { ...n, label: 'OG-2031-D hydroxy ester', structure: 'CC(O)(C)CCC(=O)OC' } : n
		)
	};
	expect(
		(await page.request.put(`/api/routes/${id}`, { data: { version: 1, document: kept } })).status()
	).toBe(200);
	await page.goto(`/routes/${id}`);
	await page.getByRole('button', { name: 'Plan protection' }).click();
	const dialog = plansDialog(page);
	await expect(dialog.getByText('No plan keeps every step of this route clean.')).toBeVisible({
		timeout: 20_000
	});
	await expect(dialog.getByRole('list', { name: 'Why there is no plan' })).toContainText('ester');
	await expect(dialog.getByTestId('plan-card')).toHaveCount(0);
});
