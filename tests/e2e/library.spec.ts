import { expect, test, type Page } from '@playwright/test';
import { asUser, cormorantId, unique } from './helpers';

// The condition library (issue 16): a chemist saves a condition on the library page, the lead
// approves it, and a step on another route uses it from the step panel; the entry's uses rise.
// The demo team has one chemist, so the lead (who may do all a chemist does) is the second user.

const DIOL = 'OCCCCO';
const MONO_TBS = 'CC(C)(C)[Si](C)(C)OCCCCO';

const entryRow = (page: Page, reagents: string) =>
	page.getByTestId('library-row').filter({ hasText: reagents });
// Columns: PG, kind, reagents, solvent, temperature, time, scale, yield, reference, author,
// approved, uses, actions.
const usesOf = (page: Page, reagents: string) => entryRow(page, reagents).getByRole('cell').nth(11);

test('a chemist saves a condition, the lead approves it and uses it on another route, and its uses rise', async ({
	browser
}) => {
	const reagents = unique('TBSOTf, 2,6-lutidine');
	const chemist = await asUser(browser, 'chemist');
	await chemist
		.getByRole('navigation', { name: 'Main' })
		.getByRole('link', { name: 'Library' })
		.click();
	await expect(chemist.getByRole('heading', { name: 'Condition library', level: 1 })).toBeVisible();
	const form = chemist.locator('form[action="?/save"]');
	await form.getByLabel('Protecting group').selectOption('TBS');
	await form.getByLabel('Kind').selectOption('install');
	await form.getByLabel('Reagents').fill(reagents);
	await form.getByLabel('Solvent').fill('CH2Cl2');
	await form.getByLabel('Temperature').fill('−78 °C');
	await form.getByLabel('Yield (%)').fill('94');
	await form.getByLabel('Reference').fill('OG notebook 12/44');
	await form.getByRole('button', { name: 'Save' }).click();
	await expect(entryRow(chemist, reagents)).toContainText('Not yet');
	await expect(usesOf(chemist, reagents)).toHaveText('0');
	// A chemist does not approve.
	await expect(entryRow(chemist, reagents).getByRole('button', { name: /^Approve/ })).toHaveCount(
		0
	);

	const lead = await asUser(browser, 'lead');
	await lead.goto('/library');
	await entryRow(lead, reagents)
		.getByRole('button', { name: `Approve the TBS install entry “${reagents}”` })
		.click();
	await expect(entryRow(lead, reagents)).toContainText('Approved');

	// Another route with a step that puts a TBS on a diol.
	const created = await lead.request.post(`/api/projects/${await cormorantId(lead)}/routes`, {
		data: {
			name: unique('Diol silylation'),
			intermediates: [
				{ id: 'a', label: 'diol', structure: DIOL, position: { x: 0, y: 0 } },
				{ id: 'b', label: 'mono-TBS ether', structure: MONO_TBS, position: { x: 360, y: 0 } }
			],
			steps: [{ id: 's1', from: ['a'], to: 'b', reagents: 'TBSCl', intent: 'protect' }]
		}
	});
	expect(created.status()).toBe(201);
	await lead.goto(`/routes/${(await created.json()).id}`);
	await lead.getByTestId('step-label').getByRole('button', { name: 'TBSCl' }).click();
	const suggestion = lead.getByTestId('suggestion').filter({ hasText: reagents });
	await expect(suggestion).toContainText('94 % yield');
	await suggestion.getByRole('button', { name: `Use this: ${reagents}` }).click();
	await expect(lead.getByLabel('Reagents and conditions')).toHaveValue(
		`${reagents}, CH2Cl2, −78 °C`
	);
	await expect(suggestion).toContainText('Used in this step');
	await expect(lead.getByTestId('save-status')).toHaveText('All changes saved', {
		timeout: 10_000
	});

	await chemist.goto('/library');
	await expect(usesOf(chemist, reagents)).toHaveText('1');
});

test('an author edits an entry in the form, and a reviewer reads the library without buttons', async ({
	browser
}) => {
	const reagents = unique('TBAF, AcOH');
	const chemist = await asUser(browser, 'chemist');
	await chemist.goto('/library');
	const form = chemist.locator('form[action="?/save"]');
	await form.getByLabel('Protecting group').selectOption('TBS');
	await form.getByLabel('Kind').selectOption('remove');
	await form.getByLabel('Reagents').fill(reagents);
	await form.getByRole('button', { name: 'Save' }).click();
	await expect(entryRow(chemist, reagents)).toBeVisible();

	await entryRow(chemist, reagents)
		.getByRole('button', { name: /^Edit the/ })
		.click();
	await expect(chemist.getByRole('heading', { name: 'Edit the saved condition' })).toBeVisible();
	await expect(form.getByLabel('Reagents')).toHaveValue(reagents);
	await form.getByLabel('Yield (%)').fill('91');
	await form.getByRole('button', { name: 'Save changes' }).click();
	await expect(entryRow(chemist, reagents)).toContainText('91 %');
	await expect(chemist.getByRole('heading', { name: 'Save a condition' })).toBeVisible();

	const reviewer = await asUser(browser, 'reviewer');
	await reviewer.goto('/library');
	await expect(reviewer.getByText('you can read the library but not change it')).toBeVisible();
	await expect(entryRow(reviewer, reagents)).toBeVisible();
	await expect(entryRow(reviewer, reagents).getByRole('button')).toHaveCount(0);
	await expect(reviewer.locator('form[action="?/save"]')).toHaveCount(0);
});
