import { expect, test, type Page } from '@playwright/test';
import { makeRoute, signInAndWait, unique } from './helpers';

// One selection, owned by the editor: whatever the canvas selects (a click, the keyboard) is what
// the side panel shows, and Delete removes only that.

const canvasNode = (page: Page, label: string) =>
	page.locator('.svelte-flow__node').filter({ hasText: label });

test('a node selected with the keyboard is the one the side panel shows and the one Delete removes', async ({
	page
}) => {
	await signInAndWait(page, 'chemist@example.com');
	const id = await makeRoute(page, unique('Selection'));
	await page.goto(`/routes/${id}`);
	await expect(page.getByTestId('intermediate-node')).toHaveCount(2);

	// Svelte Flow selects a focused node on Enter without a click event.
	await canvasNode(page, 'OG-2031-A keto ester').focus();
	await page.keyboard.press('Enter');
	await expect(
		page.getByRole('heading', { name: 'Intermediate: OG-2031-A keto ester' })
	).toBeVisible();

	// Back to the route: the canvas no longer shows it selected, and Delete removes nothing.
	await page.getByRole('button', { name: 'Back to the route' }).click();
	await expect(page.getByRole('heading', { name: 'This route' })).toBeVisible();
	await expect(canvasNode(page, 'OG-2031-A keto ester')).not.toHaveClass(/selected/);
	await page.keyboard.press('Delete');
	await expect(page.getByTestId('intermediate-node')).toHaveCount(2);

	// Selected again, Delete removes exactly the node the panel showed.
	await canvasNode(page, 'OG-2031-C hydroxy ketone').focus();
	await page.keyboard.press('Enter');
	await expect(
		page.getByRole('heading', { name: 'Intermediate: OG-2031-C hydroxy ketone' })
	).toBeVisible();
	await page.keyboard.press('Delete');
	await expect(canvasNode(page, 'OG-2031-C hydroxy ketone')).toHaveCount(0);
	await expect(canvasNode(page, 'OG-2031-A keto ester')).toHaveCount(1);
	await expect(page.getByRole('heading', { name: 'This route' })).toBeVisible();
});
