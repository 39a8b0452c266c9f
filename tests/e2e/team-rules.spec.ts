import { expect, test } from '@playwright/test';
import { oneStepRoute, signInAndWait, unique } from './helpers';

// The team's rules page in the browser: the lead adds an override with the form and sees its cell
// bordered and named "team rule"; a chemist reads the same table without the form; the lead
// removes it again (so the demo team's table is as seeded for the other specs).

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
	// The demo team already has its own TBDPS rule; this one is added beside it.
	const added = lead.getByTestId('team-rule').filter({ hasText: 'Grubbs II left the PMB ether' });
	await expect(added).toHaveCount(1);

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
	await expect(added).toHaveCount(0);
	await expect(pmbUnderMetathesis(lead)).not.toHaveAttribute('data-team-rule', 'true');
});

// A methyl ester saponified with LiOH beside a primary TBS ether: rules/protecting-groups.json rates
// alkyl TBS ethers stable to aqueous hydroxide (Greene's, 5th ed., ch. 4 — from memory), so only
// the team's rule for LiOH makes this step clash. A rule for the one reagent keeps the other specs'
// routes as the book rates them while this test runs.
const TBS_ESTER = 'COC(=O)CCCO[Si](C)(C)C(C)(C)C';
const TBS_ACID = 'OC(=O)CCCO[Si](C)(C)C(C)(C)C';
const LIOH_REASON = 'LiOH in THF/H2O strips our primary TBS ethers at 50 °C (fictional)';

test('a lead adds a team rule for one reagent and the route map flags the step with "team rule"', async ({
	browser
}) => {
	test.slow();
	const lead = await (await browser.newContext()).newPage();
	await signInAndWait(lead, 'lead@example.com');
	const routeId = await oneStepRoute(lead, {
		name: unique('TBS acid by saponification'),
		from: { label: 'TBS ester', structure: TBS_ESTER },
		to: { label: 'TBS acid', structure: TBS_ACID },
		reagents: 'LiOH, THF, H2O'
	});
	await lead.goto(`/routes/${routeId}`);
	// Before the rule: the book's rating, no clash on the step.
	await lead.getByTestId('step-label').getByRole('button', { name: 'LiOH, THF, H2O' }).click();
	await expect(lead.getByText(/No clashes found/)).toBeVisible({ timeout: 15_000 });

	await rulesPageOf(lead);
	const form = lead.getByRole('form', { name: 'Add a team rule' });
	await form.getByLabel('Protecting group or free group').selectOption('TBS');
	await form.getByLabel('Condition class').selectOption('base-aqueous');
	await form.getByLabel(/^Reagent/).fill('LiOH');
	await form.getByLabel('Rating').selectOption('labile');
	await form.getByLabel('Reason').fill(LIOH_REASON);
	await form.getByLabel('Source').fill('Notebook LM-9, p. 4 (fictional)');
	await form.getByRole('button', { name: 'Add team rule' }).click();
	await expect(lead.getByText('The team rule is set')).toBeVisible();

	try {
		await lead.goto(`/routes/${routeId}`);
		const marker = lead.getByRole('button', { name: /clash/ });
		await expect(marker).toBeVisible({ timeout: 15_000 });
		await marker.click();
		await expect(lead.getByRole('list', { name: 'Clashes' })).toContainText(
			`team rule: ${LIOH_REASON}`
		);
	} finally {
		await rulesPageOf(lead);
		lead.once('dialog', (dialog) => dialog.accept());
		await lead.getByRole('button', { name: /Remove the team rule for TBS under/ }).click();
		await expect(lead.getByTestId('team-rule').filter({ hasText: LIOH_REASON })).toHaveCount(0);
	}
});
