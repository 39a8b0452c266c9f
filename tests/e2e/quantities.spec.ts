import { expect, test, type Page } from '@playwright/test';
import { asUser, cormorantId, signInAndWait, unique } from './helpers';

// Issue 14's story on the invented Cormorant scenario: the demo route protects a fictional aryl
// aldehyde (OG-2031-F) as its ethylene acetal in refluxing toluene under a water-separating trap.
// Each run works on its own copy of that route (its quantities and trap log cleared), so reruns
// and the demo itself stay as they were. Worked values, common practice: 20.0 g of
// 4-methylbenzaldehyde (120.15 g/mol) is 166.5 mmol and frees 166.5 mmol of water, 3.0 g, 3.0 mL.

const DEMO_ROUTE = 'OG-2031 aryl aldehyde — ethylene acetal';
const STEP_TEXT = /ethylene glycol/;

const saved = (page: Page) =>
	expect(page.getByTestId('save-status')).toHaveText('All changes saved', { timeout: 10_000 });
const materialRow = (page: Page, index: number) => page.getByTestId('material-row').nth(index);
const openStep = async (page: Page) => {
	await page.getByTestId('step-label').getByRole('button', { name: STEP_TEXT }).click();
	await expect(page.getByRole('heading', { name: /^Step:/ })).toBeVisible();
};

async function copyOfDemoRoute(page: Page): Promise<string> {
	const projectId = await cormorantId(page);
	const { routes }: { routes: { id: string; name: string }[] } = await (
		await page.request.get(`/api/projects/${projectId}/routes`)
	).json();
	const demo = routes.find((r) => r.name === DEMO_ROUTE);
	expect(demo, 'the demo scenario has the acetal route').toBeTruthy();
	const { document } = await (await page.request.get(`/api/routes/${demo!.id}`)).json();
	expect(document.steps[0].waterRemoval.log.length).toBeGreaterThanOrEqual(4);
	const steps = document.steps.map(
		({ quantities: _q, waterRemoval: _w, ...step }: Record<string, unknown>) => step
	);
	const created = await page.request.post(`/api/projects/${projectId}/routes`, {
		data: { ...document, name: unique('Acetal run'), steps }
	});
	expect(created.status()).toBe(201);
	return (await created.json()).id;
}

async function addMaterial(page: Page, name: string, amount: string, role?: string) {
	const rows = page.getByTestId('material-row');
	const index = await rows.count();
	await page.getByRole('button', { name: 'Add material' }).click();
	await expect(rows).toHaveCount(index + 1);
	const row = materialRow(page, index);
	await row.getByLabel('Name', { exact: true }).fill(name);
	if (role) {
		await row.getByLabel('Role').selectOption(role);
	}
	await row.getByLabel('Amount').fill(amount);
}

async function addReading(page: Page, minutes: string, volume: string) {
	const form = page.getByRole('form', { name: 'Add a trap reading' });
	await form.getByLabel('Minutes').fill(minutes);
	await form.getByLabel('Water, mL').fill(volume);
	await form.getByRole('button', { name: 'Add reading' }).click();
}

test('a chemist fills the acetal step’s quantities, logs the trap, and finds it all after a reload; a reviewer reads it', async ({
	page,
	browser
}) => {
	// A long story: two people, a reload, and a computation after each edit.
	test.slow();
	await signInAndWait(page, 'chemist@example.com');
	const id = await copyOfDemoRoute(page);
	await page.goto(`/routes/${id}`);
	await openStep(page);

	// The table starts from the step's own substrate and product.
	await expect(page.getByTestId('material-row')).toHaveCount(2);
	await expect(materialRow(page, 0).getByLabel('Name', { exact: true })).toHaveValue(
		'OG-2031-F aryl aldehyde'
	);
	await expect(materialRow(page, 0).getByLabel('Role')).toHaveValue('limiting');
	await expect(materialRow(page, 1).getByLabel('Role')).toHaveValue('product');

	await materialRow(page, 0).getByLabel('Amount').fill('20 g');
	await addMaterial(page, 'ethylene glycol', '12 mL');
	await addMaterial(page, 'toluene', '75 mL', 'solvent');

	// A typo is refused beside the field and never saved.
	// The field's own message is tied to the input, so it is read out with it.
	const amount = materialRow(page, 3).getByLabel('Amount');
	await amount.fill('75 oz');
	await expect(amount).toHaveAttribute('aria-invalid', 'true');
	await expect(amount).toHaveAccessibleDescription(/“oz” is not a unit/);
	await amount.fill('75 mL');
	await expect(amount).not.toHaveAttribute('aria-invalid');
	await expect(materialRow(page, 3).getByText('is not a unit')).toHaveCount(0);

	const computed = page.getByRole('table', { name: 'Computed quantities' });
	await expect(computed.getByRole('row', { name: /ethylene glycol/ })).toContainText('215');
	await expect(computed.getByRole('row', { name: /aryl aldehyde/ })).toContainText(/166\.\d|167/);

	// The step puts a dioxolane on: the card is offered.
	await expect(page.getByText('This step puts on a 1,3-dioxolane')).toBeVisible();
	await page.getByRole('button', { name: 'Add water removal' }).click();
	const card = page.getByTestId('water-removal');
	await expect(card.getByLabel('Solvent')).toHaveValue('toluene');
	// A number field is stored when it is left (its change event), as a chemist tabs on.
	await card.getByLabel('Trap capacity, mL').fill('10');
	await card.getByLabel('Trap capacity, mL').blur();
	await expect(card.getByTestId('theoretical-water')).toContainText(/(166\.\d|167) mmol/);
	await expect(card.getByTestId('theoretical-water')).toContainText(/\b(2\.9\d|3(\.0\d?)?) mL/);
	await expect(card.getByTestId('water-layer')).toContainText('lower layer');

	// Levelled off: each of the last two intervals adds under 2 % of theory, at ≥ 95 % of it
	// (src/lib/quantities/trap-progress.ts).
	for (const [minutes, volume] of [
		['0', '0'],
		['45', '2.9'],
		['90', '2.95'],
		['120', '2.96']
	] as const) {
		await addReading(page, minutes, volume);
	}
	await expect(card.getByTestId('trap-reading')).toHaveCount(4);
	await expect(card.getByTestId('trap-plot')).toBeVisible();
	const status = card.getByTestId('trap-status');
	await expect(status).toHaveAttribute('data-status', 'complete');
	await expect(status).toContainText('Complete: the readings have levelled off');
	await expect(page.getByRole('list', { name: 'Cautions for these quantities' })).toBeVisible();
	await saved(page);

	await page.reload();
	await openStep(page);
	await expect(page.getByTestId('material-row')).toHaveCount(4);
	await expect(materialRow(page, 0).getByLabel('Amount')).toHaveValue('20 g');
	await expect(materialRow(page, 2).getByLabel('Amount')).toHaveValue('12 mL');
	await expect(materialRow(page, 3).getByLabel('Role')).toHaveValue('solvent');
	await expect(card.getByLabel('Trap capacity, mL')).toHaveValue('10');
	await expect(card.getByTestId('trap-reading')).toHaveCount(4);
	await expect(card.getByTestId('trap-status')).toHaveAttribute('data-status', 'complete');

	const reviewer = await asUser(browser, 'reviewer');
	await reviewer.goto(`/routes/${id}`);
	await openStep(reviewer);
	const readOnly = reviewer.getByTestId('water-removal');
	await expect(readOnly.getByTestId('theoretical-water')).toContainText('mmol');
	await expect(readOnly.getByTestId('trap-reading')).toHaveCount(4);
	await expect(readOnly.getByTestId('trap-plot')).toBeVisible();
	await expect(reviewer.getByRole('table', { name: 'Computed quantities' })).toBeVisible();
	await expect(reviewer.getByTestId('material-row')).toHaveCount(0);
	await expect(
		reviewer.getByRole('button', { name: /Add material|Add reading|Remove/ })
	).toHaveCount(0);
	// The one field a reviewer gets is the step's comment (issue 15); no amount, name or reading.
	await expect(reviewer.getByRole('textbox')).toHaveCount(1);
	await expect(reviewer.getByRole('textbox', { name: 'Comment on this step' })).toBeVisible();
	await reviewer.context().close();
});
