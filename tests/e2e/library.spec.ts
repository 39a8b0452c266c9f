import { expect, test, type Page } from '@playwright/test';
import { asUser, oneStepRoute, unique } from './helpers';

// The condition library (issue 16): a chemist saves a step's conditions to the library from the
// route map, the lead approves the entry, and a step on another route uses it from the step
// panel; the entry's uses rise. The demo team has one chemist, so the lead (who may do all a
// chemist does) is the second user.

const DIOL = 'OCCCCO';
const MONO_TBS = 'CC(C)(C)[Si](C)(C)OCCCCO';

const entryRow = (page: Page, reagents: string) =>
	page.getByTestId('library-row').filter({ hasText: reagents });
// Columns: PG, kind, reagents, solvent, temperature, time, scale, yield, reference, author,
// approved, uses, actions.
const usesOf = (page: Page, reagents: string) => entryRow(page, reagents).getByRole('cell').nth(11);

/** A route in Cormorant with one step that puts a TBS on a diol, opened on its step. */
async function silylationRoute(page: Page, reagents: string) {
	const id = await oneStepRoute(page, {
		name: unique('Diol silylation'),
		from: { label: 'diol', structure: DIOL },
		to: { label: 'mono-TBS ether', structure: MONO_TBS },
		reagents,
		intent: 'protect'
	});
	await page.goto(`/routes/${id}`);
	await page.getByTestId('step-label').getByRole('button', { name: reagents }).click();
}

test('a chemist saves a step’s conditions, the lead approves them and uses them on another route, and the uses rise', async ({
	browser
}) => {
	test.slow();
	// Common practice (Corey 1981 for the silyl triflate): TBSOTf and 2,6-lutidine at −78 °C.
	const reagents = unique('TBSOTf, 2,6-lutidine, CH2Cl2, −78 °C');
	const chemist = await asUser(browser, 'chemist');
	await silylationRoute(chemist, reagents);
	await chemist.getByRole('button', { name: 'Save this step’s conditions to the library' }).click();
	const save = chemist.getByRole('form', { name: 'Save this step’s conditions to the library' });
	// The structures show a TBS put on: chosen already.
	await expect(save.getByLabel('Protecting group')).toHaveValue('TBS', { timeout: 15_000 });
	await expect(save.getByLabel('Kind')).toHaveValue('install');
	await save.getByLabel('Yield (%)').fill('94');
	await save.getByLabel('Reference (DOI or notebook page)').fill('OG notebook 12/44');
	await save.getByRole('button', { name: 'Save' }).click();
	await expect(
		chemist.getByText('Saved to the team’s library and linked to this step.')
	).toBeVisible();
	const own = chemist.getByTestId('suggestion').filter({ hasText: reagents });
	await expect(own).toContainText('Used in this step');
	await expect(own).toContainText('used in 1 step');

	await chemist
		.getByRole('navigation', { name: 'Main' })
		.getByRole('link', { name: 'Library' })
		.click();
	await expect(chemist.getByRole('heading', { name: 'Condition library', level: 1 })).toBeVisible();
	await expect(entryRow(chemist, reagents)).toContainText('Not yet');
	await expect(usesOf(chemist, reagents)).toHaveText('1');
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

	// Another route, whose step still has the textbook reagent.
	await silylationRoute(lead, 'TBSCl, imidazole');
	const suggestion = lead.getByTestId('suggestion').filter({ hasText: reagents });
	await expect(suggestion).toContainText('94 % yield');
	await expect(suggestion).toContainText('Approved');
	await suggestion.getByRole('button', { name: `Use this: ${reagents}` }).click();
	await expect(lead.getByLabel('Reagents and conditions')).toHaveValue(reagents);
	await expect(suggestion).toContainText('Used in this step');
	await expect(lead.getByTestId('save-status')).toHaveText('All changes saved', {
		timeout: 10_000
	});

	await chemist.goto('/library');
	await expect(usesOf(chemist, reagents)).toHaveText('2');
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
