import { expect, test } from '@playwright/test';
import { makeRoute, signInAndWait, unique } from './helpers';

// The printable review copy of the invented Cormorant route: a keto ester (OG-2031-A) meets a
// Grignard reagent while its ketone is free, so the copy must print that clash.

test('a chemist opens the review copy from the route page; printed, it drops the app header and buttons', async ({
	page
}) => {
	const name = unique('Review copy');
	await signInAndWait(page, 'chemist@example.com');
	const routeId = await makeRoute(page, name);
	await page.goto(`/routes/${routeId}`);
	await page.getByTestId('report-link').click();
	await expect(page).toHaveURL(new RegExp(`/routes/${routeId}/report$`));

	const copy = page.getByTestId('review-copy');
	await expect(copy.getByRole('heading', { name, level: 1 })).toBeVisible();
	await expect(page.getByTestId('report-status')).toHaveText('Draft, version 1');
	await expect(page.getByTestId('report-approval')).toHaveText('Not approved.');
	await expect(
		copy.getByRole('heading', {
			name: 'Step 1: OG-2031-A keto ester → OG-2031-C hydroxy ketone',
			level: 2
		})
	).toBeVisible();
	await expect(copy.getByRole('img', { name: /OG-2031-A keto ester/ })).toBeVisible();
	await expect(page.getByTestId('step-check')).toContainText('Clash:');
	await expect(page.getByTestId('step-hazards')).toContainText('safety data sheet (SDS)');

	const printButton = page.getByRole('button', { name: 'Print or save as PDF' });
	await expect(printButton).toBeVisible();
	// The app's header is there on screen, so "hidden" below cannot pass for a missing element.
	const appHeader = page.locator('header');
	await expect(appHeader).toHaveCount(1);
	await expect(appHeader).toBeVisible();
	await page.emulateMedia({ media: 'print' });
	await expect(printButton).toBeHidden();
	await expect(appHeader).toBeHidden();
	await expect(copy.getByRole('heading', { name, level: 1 })).toBeVisible();
	await expect(page.getByTestId('step-check')).toBeVisible();
});
