import { expect, test } from '@playwright/test';
import { signInAndWait } from './helpers';

// The team's rules page in the browser: the lead adds an override with the form and sees its cell
// bordered and named "team rule"; a chemist reads the same table without the form; the lead
// removes it again (so the demo team's table is the book's for the other specs).

async function rulesPageOf(page: import('@playwright/test').Page) {
	const teamId = await page.evaluate(
		async () => (await (await fetch('/api/projects')).json()).projects[0].teamId as string
	);
	await page.goto(`/teams/${teamId}`);
	await page.getByRole('link', { name: 'The team’s rules' }).click();
	// The first page in a fresh server reads and validates the rule table (seconds on a busy machine).
	await expect(page.getByRole('heading', { name: 'The team’s rules', level: 1 })).toBeVisible({
		timeout: 20_000
	});
}

const pmbUnderMetathesis = (page: import('@playwright/test').Page) =>
	page.locator('[data-pg="PMB"] td[data-condition="metathesis"]');

test('a lead adds a team rule and sees the cell marked; a chemist reads it; the lead removes it', async ({
	browser
}) => {
	// Two people sign in and a fresh server reads the rule table: slow on a shared machine.
	test.slow();
	const lead = await (await browser.newContext()).newPage();
	await signInAndWait(lead, 'lead@example.com');
	await rulesPageOf(lead);
	// rules/protecting-groups.json rates PMB stable to olefin metathesis.
	await expect(pmbUnderMetathesis(lead)).toHaveAttribute('title', /stable$/);

	const form = lead.getByRole('form', { name: 'Add a team rule' });
	await form.getByLabel('Protecting group or free group').selectOption('PMB');
	await form.getByLabel('Condition class').selectOption('metathesis');
	await form.getByLabel('Rating').selectOption('caution');
	await form.getByLabel('Reason').fill('Grubbs II left the PMB ether partly oxidised on OG-2031.');
	await form.getByLabel('Source').fill('Notebook LM-7, p. 12 (fictional)');
	await form.getByRole('button', { name: 'Add team rule' }).click();
	await expect(lead.getByText('The team rule is set')).toBeVisible();

	const cell = pmbUnderMetathesis(lead);
	await expect(cell).toHaveAttribute('data-team-rule', 'true');
	await expect(cell).toHaveAttribute('title', 'PMB under Olefin metathesis: caution (team rule)');
	await expect(cell).toContainText('caution, team rule');
	await expect(lead.getByTestId('team-rule')).toContainText('Grubbs II left the PMB ether');

	const chemist = await (await browser.newContext()).newPage();
	await signInAndWait(chemist, 'chemist@example.com');
	await rulesPageOf(chemist);
	await expect(
		chemist.getByText('Only a lead of the team can add or remove overrides.')
	).toBeVisible();
	await expect(chemist.getByRole('button', { name: 'Add team rule' })).toHaveCount(0);
	await expect(pmbUnderMetathesis(chemist)).toHaveAttribute('data-team-rule', 'true');

	lead.once('dialog', (dialog) => dialog.accept());
	await lead
		.getByRole('button', { name: /Remove the team rule for PMB under Olefin metathesis/ })
		.click();
	await expect(lead.getByTestId('team-rule')).toHaveCount(0);
	await expect(pmbUnderMetathesis(lead)).not.toHaveAttribute('data-team-rule', 'true');
});
