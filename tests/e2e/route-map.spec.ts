import { expect, test, type Page } from '@playwright/test';
import {
	asUser,
	cormorantId,
	HYDROXY_KETONE,
	KETO_ESTER,
	makeRoute,
	PROJECT,
	signInAndWait,
	unique
} from './helpers';

// Everything here is the invented Cormorant scenario (see helpers.ts): a fictional keto ester
// (OG-2031-A) meets a Grignard reagent while its ketone is still free.

const node = (page: Page, label: string) =>
	page.getByTestId('intermediate-node').filter({ hasText: label });
// The add form's own fields: an open intermediate panel has a "Label" and a structure field too.
const structureField = (page: Page) => page.locator('#add-structure');
const saved = (page: Page) =>
	expect(page.getByTestId('save-status')).toHaveText('All changes saved', { timeout: 10_000 });

async function addIntermediate(page: Page, smiles: string, label: string) {
	await structureField(page).fill(smiles);
	await page.locator('#add-label').fill(label);
	await page.getByRole('button', { name: 'Add intermediate' }).click();
	await expect(node(page, label)).toBeVisible();
}

test('a chemist creates a route, pastes two SMILES, joins them with a step, and finds it all after a reload', async ({
	page
}) => {
	const name = unique('Grignard first');
	await signInAndWait(page, 'chemist@example.com');
	await page.getByRole('link', { name: PROJECT }).click();
	await page.getByLabel('New route').fill(name);
	await page.getByRole('button', { name: 'Create route' }).click();
	await expect(page).toHaveURL(/\/routes\/[0-9a-f-]{36}$/);
	await expect(page.getByRole('heading', { name, level: 1 })).toBeVisible();

	await addIntermediate(page, KETO_ESTER, 'OG-2031-A keto ester');
	await expect(
		node(page, 'OG-2031-A keto ester').getByRole('list', { name: 'Free groups' })
	).toContainText('ketone');
	await expect(
		node(page, 'OG-2031-A keto ester').getByRole('img', { name: /Structure of OG-2031-A/ })
	).toBeVisible();

	// An unreadable SMILES is refused beside the field and nothing is added.
	await structureField(page).fill('C1CC(');
	await page.getByRole('button', { name: 'Add intermediate' }).click();
	await expect(page.getByText(/SMILES/).filter({ hasText: /cannot|never closed/ })).toBeVisible();
	await expect(page.getByTestId('intermediate-node')).toHaveCount(1);

	await addIntermediate(page, HYDROXY_KETONE, 'OG-2031-C hydroxy ketone');
	await node(page, 'OG-2031-A keto ester').click();
	await page.getByLabel('Step to').selectOption({ label: 'OG-2031-C hydroxy ketone' });
	await page.getByRole('button', { name: 'Add step' }).click();
	await page.getByRole('textbox', { name: 'Reagents and conditions' }).fill('MeMgBr, THF');
	await expect(page.getByTestId('step-label')).toContainText('MeMgBr, THF');
	await expect(page.getByText('Check the safety data sheet (SDS) of every reagent')).toBeVisible();
	await saved(page);
	// The check runs after the save: MeMgBr would add to the ketone the chemist meant to keep.
	await expect(page.getByRole('button', { name: /clash/ })).toBeVisible({ timeout: 10_000 });
	await expect(page.getByRole('list', { name: 'Clashes' })).toContainText(/ketone/i);

	await page.reload();
	await expect(page.getByTestId('intermediate-node')).toHaveCount(2);
	await expect(node(page, 'OG-2031-C hydroxy ketone')).toBeVisible();
	await expect(page.getByTestId('step-label')).toContainText('MeMgBr, THF');
	await expect(page.getByRole('button', { name: /clash/ })).toBeVisible();
	await page.getByTestId('step-label').getByRole('button', { name: 'MeMgBr, THF' }).click();
	await expect(page.getByRole('textbox', { name: 'Reagents and conditions' })).toHaveValue(
		'MeMgBr, THF'
	);
});

test('a step with a Grignard reagent on a free ketone shows a clash marker, its message and the atoms', async ({
	page
}) => {
	await signInAndWait(page, 'chemist@example.com');
	const id = await makeRoute(page, unique('Unprotected ketone'));
	await page.goto(`/routes/${id}`);
	const marker = page.getByRole('button', { name: /clash/ });
	await expect(marker).toBeVisible({ timeout: 10_000 });
	await marker.click();
	await expect(page.getByRole('list', { name: 'Clashes' })).toContainText(/ketone/i);
	await expect(page.getByRole('list', { name: 'Reagent hazards' })).toContainText('MeMgBr');
	// The substrate is redrawn with the clashing atoms shaded, and its frame turns to the clash colour.
	await expect(node(page, 'OG-2031-A keto ester')).toHaveClass(/border-clash/);
});

test('a step with reagent text Orthogon does not know says so, and a step it cannot read says “Not checked”', async ({
	page
}) => {
	await signInAndWait(page, 'chemist@example.com');
	// OG-Cat 17: an in-house catalyst code no reagent table lists. The second step's product is
	// a SMILES still being typed (an unclosed branch), so that step cannot be checked. The nodes
	// stand far apart so no node covers a step's label.
	const created = await page.request.post(`/api/projects/${await cormorantId(page)}/routes`, {
		data: {
			name: unique('Unknown additive'),
			intermediates: [
				{ id: 'a', label: 'OG-2031-A keto ester', structure: KETO_ESTER, position: { x: 0, y: 0 } },
				{
					id: 'c',
					label: 'OG-2031-C hydroxy ketone',
					structure: HYDROXY_KETONE,
					position: { x: 640, y: 0 }
				},
				{ id: 'd', label: 'OG-2031-D half drawn', structure: 'CC(', position: { x: 1280, y: 0 } }
			],
			steps: [
				{ id: 's1', from: ['a'], to: 'c', reagents: 'MeMgBr, OG-Cat 17, THF' },
				{ id: 's2', from: ['c'], to: 'd', reagents: 'NaBH4, MeOH' }
			]
		}
	});
	expect(created.status()).toBe(201);
	await page.goto(`/routes/${(await created.json()).id}`);

	const notice = 'Not recognised: OG-Cat 17 — its effect is not checked.';
	const grignard = page.getByTestId('step-label').filter({ hasText: 'MeMgBr' });
	await expect(grignard.getByTestId('step-unrecognized')).toHaveText(notice, { timeout: 10_000 });
	const halfDrawn = page.getByTestId('step-label').filter({ hasText: 'NaBH4' });
	const notChecked = halfDrawn.getByRole('button', {
		name: /^Not checked: The product cannot be read/
	});
	await expect(notChecked).toBeVisible();
	await expect(halfDrawn).toContainText('Not checked');

	await notChecked.click();
	await expect(page.getByRole('heading', { name: /^Step:/ })).toContainText('OG-2031-D half drawn');
	await expect(page.getByText(/^Not checked: The product cannot be read/).last()).toBeVisible();
	await expect(page.getByText(/No clashes found/)).toHaveCount(0);

	await grignard.getByRole('button', { name: 'MeMgBr, OG-Cat 17, THF' }).click();
	await expect(page.getByRole('list', { name: 'Clashes' })).toContainText(/ketone/i);
	await expect(page.getByText(notice)).toHaveCount(2);
});

test('a reviewer sees the same map read-only', async ({ page, browser }) => {
	const chemist = await asUser(browser, 'chemist');
	const id = await makeRoute(chemist, unique('For review'));
	await chemist.context().close();

	await signInAndWait(page, 'reviewer@example.com');
	await page.goto(`/routes/${id}`);
	await expect(page.getByText('You can read this route')).toBeVisible();
	await expect(page.getByTestId('intermediate-node')).toHaveCount(2);
	await expect(page.getByTestId('step-label')).toContainText('MeMgBr, THF');
	await expect(page.getByRole('button', { name: 'Add intermediate' })).toHaveCount(0);
	await expect(page.getByRole('button', { name: 'Auto-layout' })).toHaveCount(0);
	await expect(page.locator('.svelte-flow__node.draggable')).toHaveCount(0);

	await page.getByTestId('step-label').getByRole('button', { name: 'MeMgBr, THF' }).click();
	await expect(page.getByRole('heading', { name: /^Step:/ })).toBeVisible();
	// The one field a reviewer gets is the step's comment (issue 15): nothing of the route itself.
	await expect(page.getByRole('textbox')).toHaveCount(1);
	await expect(page.getByRole('textbox', { name: 'Comment on this step' })).toBeVisible();
	await page.keyboard.press('Delete');
	await expect(page.getByTestId('intermediate-node')).toHaveCount(2);
	expect(
		(
			await page.request.put(`/api/routes/${id}`, {
				data: { version: 1, document: { name: 'x', intermediates: [], steps: [] } }
			})
		).status()
	).toBe(403);
});

test('when someone else saved first, the page says so and keeps the chemist’s typing as a copy', async ({
	page,
	browser
}) => {
	await signInAndWait(page, 'chemist@example.com');
	const name = unique('Contested');
	const id = await makeRoute(page, name, 'MeMgBr');
	await page.goto(`/routes/${id}`);

	const lead = await asUser(browser, 'lead');
	await lead.goto(`/routes/${id}`);
	await lead.getByTestId('step-label').getByRole('button', { name: 'MeMgBr' }).click();
	await lead.getByRole('textbox', { name: 'Reagents and conditions' }).fill('MeMgBr, Et2O, 0 °C');
	await saved(lead);

	await page.getByTestId('step-label').getByRole('button', { name: 'MeMgBr' }).click();
	await page.getByRole('textbox', { name: 'Reagents and conditions' }).fill('MeMgBr, THF, −78 °C');
	const notice = page.getByRole('alert').filter({ hasText: 'Someone else changed this route' });
	await expect(notice).toBeVisible({ timeout: 10_000 });
	await expect(page.getByTestId('save-status')).toContainText('Not saved');
	await expect(page.getByRole('textbox', { name: 'Reagents and conditions' })).toHaveValue(
		'MeMgBr, THF, −78 °C'
	);

	await notice.getByRole('button', { name: 'Keep mine as a copy' }).click();
	await expect(page).not.toHaveURL(new RegExp(id));
	await expect(page.getByRole('heading', { name: `${name} (my copy)`, level: 1 })).toBeVisible();
	// The notice is the app's, not the old route screen's: it outlives the move to the copy.
	await expect(
		page.getByRole('status').filter({ hasText: `Your version is saved as “${name} (my copy)”.` })
	).toBeVisible();
	await expect(page.getByTestId('step-label')).toContainText('MeMgBr, THF, −78 °C');

	// Their version is untouched.
	await lead.reload();
	await expect(lead.getByTestId('step-label')).toContainText('MeMgBr, Et2O, 0 °C');
	await lead.context().close();
});

test('the structure editor loads only when the drawing dialog opens', async ({ page }) => {
	await signInAndWait(page, 'chemist@example.com');
	const id = await makeRoute(page, unique('Drawing'));
	const scripts: string[] = [];
	const problems: string[] = [];
	page.on('request', (request) => {
		if (request.resourceType() === 'script') {
			scripts.push(request.url());
		}
	});
	page.on('console', (message) => {
		if (message.type() === 'error') {
			problems.push(message.text());
		}
	});
	page.on('pageerror', (error) => problems.push(error.message));
	await page.goto(`/routes/${id}`);
	await expect(page.getByTestId('intermediate-node')).toHaveCount(2);
	const before = scripts.length;
	await page.getByRole('button', { name: 'Draw…' }).first().click();
	const dialog = page.getByRole('dialog', { name: 'Draw a structure' });
	await expect(dialog.getByTestId('structure-editor').locator('canvas').first()).toBeVisible({
		timeout: 15_000
	});
	expect(scripts.length).toBeGreaterThan(before);
	await dialog.getByRole('button', { name: 'Cancel' }).click();
	await expect(dialog).toBeHidden();

	// A structure in the field opens in the editor, and what the editor holds comes back as a node.
	await structureField(page).fill('OCCO');
	await page.locator('#add-label').fill('ethylene glycol');
	await page.getByRole('button', { name: 'Draw…' }).first().click();
	await expect(dialog.getByTestId('structure-editor').locator('canvas').first()).toBeVisible();
	await dialog.getByRole('button', { name: 'Use this structure' }).click();
	await expect(node(page, 'ethylene glycol')).toBeVisible();
	await expect(node(page, 'ethylene glycol')).toContainText('C2H6O2');

	// Delete removes the selected intermediate; Ctrl+Z brings it back.
	await node(page, 'ethylene glycol').click();
	await page.keyboard.press('Delete');
	await expect(node(page, 'ethylene glycol')).toHaveCount(0);
	await page.keyboard.press('Control+z');
	await expect(node(page, 'ethylene glycol')).toBeVisible();
	expect(problems).toEqual([]);
});

test('the project lists its routes: filter, import an SDF, duplicate and archive', async ({
	page
}) => {
	await signInAndWait(page, 'chemist@example.com');
	const name = unique('Listed');
	const id = await makeRoute(page, name);
	await page.getByRole('link', { name: PROJECT }).click();
	const row = page.getByTestId('route-row').filter({ hasText: name });
	await expect(row).toContainText('Draft');
	await page.getByLabel('Status', { exact: true }).selectOption('approved');
	await expect(row).toHaveCount(0);
	await page.getByLabel('Status', { exact: true }).selectOption('');
	await expect(row).toBeVisible();

	const sdf = await (await page.request.get(`/api/routes/${id}/export?format=sdf`)).text();
	await page.getByLabel('Import SDF or route JSON').setInputFiles({
		name: 'imported-og2031.sdf',
		mimeType: 'chemical/x-mdl-sdfile',
		buffer: Buffer.from(sdf)
	});
	await expect(page.getByRole('heading', { name: 'imported-og2031', level: 1 })).toBeVisible();
	await expect(page.getByTestId('step-label')).toContainText('MeMgBr, THF');
	await page.goBack();

	await page.getByRole('button', { name: `Duplicate route ${name}` }).click();
	await expect(page.getByTestId('route-row').filter({ hasText: `${name} (copy)` })).toBeVisible();
	await page.getByRole('button', { name: `Archive route ${name} (copy)` }).click();
	await expect(page.getByTestId('route-row').filter({ hasText: `${name} (copy)` })).toHaveCount(0);
	await page.getByRole('link', { name: 'Show archived routes' }).click();
	await expect(page.getByTestId('route-row').filter({ hasText: `${name} (copy)` })).toContainText(
		'archived'
	);
});
