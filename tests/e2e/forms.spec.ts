import { expect, test } from '@playwright/test';
import { makeRoute, signInAndWait, unique } from './helpers';

// Every form field goes through one wrapper (src/lib/components/ui/field/Field.svelte), which ties
// the label, the hint and the error to the control; a screen reader reads them with the field.

test('a sign-in with no e-mail ties the error to the field it is about', async ({ page }) => {
	await page.goto('/signin');
	await page.getByRole('button', { name: 'Sign in' }).click();
	const email = page.getByLabel('E-mail');
	await expect(email).toHaveAttribute('aria-invalid', 'true');
	await expect(email).toHaveAccessibleDescription(
		'Enter the e-mail address you were invited with.'
	);
	const errorId = await email.getAttribute('aria-describedby');
	await expect(page.locator(`#${errorId}`)).toHaveText(
		'Enter the e-mail address you were invited with.'
	);
});

test('the account page describes the new password and the revoke checkbox by their hints, and keeps the limit', async ({
	page
}) => {
	await signInAndWait(page, 'chemist@example.com');
	await page.goto('/account');
	const next = page.getByLabel('New password', { exact: true });
	await expect(next).toHaveAccessibleDescription('At least 10 characters.');
	await expect(next).toHaveAttribute('maxlength', '72');
	await expect(page.getByLabel('Also revoke all my API tokens')).toHaveAccessibleDescription(
		'Your other signed-in browsers are signed out either way.'
	);
	await expect(page.getByLabel('Label')).toHaveAttribute('maxlength', '80');
});

test('the route map names condition classes and protecting groups without downloading the rule table', async ({
	page
}) => {
	// Planning is chemistry on a shared pool: on a busy machine it takes longer than the default.
	test.slow();
	const asked: string[] = [];
	page.on('request', (request) => asked.push(new URL(request.url()).pathname));
	await signInAndWait(page, 'chemist@example.com');
	const id = await makeRoute(page, unique('Labels with the page'));
	await page.goto(`/routes/${id}`);
	await expect(page.getByTestId('intermediate-node')).toHaveCount(2);

	// The condition list of a step reads the labels that came with the page.
	await page.getByTestId('step-label').first().click();
	const add = page.getByLabel('Add a condition class');
	await expect(add.locator('option', { hasText: 'Strong acid' })).toHaveCount(1);

	// So do the plans' protecting-group names.
	await page.getByRole('button', { name: 'Plan protection' }).click();
	const dialog = page.getByRole('dialog', { name: 'Protection plans' });
	await expect(dialog.getByTestId('plan-card').first()).toBeVisible({ timeout: 60_000 });
	await expect(dialog).toContainText('(1,3-dioxolane (ethylene acetal or ketal))');

	expect(asked.filter((path) => path === '/api/rules')).toEqual([]);
});
