import { expect, test, type Page } from '@playwright/test';
import { asUser, makeRoute, signInAndWait, unique } from './helpers';

// The review story of issue 15 on the invented Cormorant route (a keto ester meeting a Grignard
// reagent), played by the demo team: Tomas Ridley (chemist) asks Priya Vance (reviewer) to review;
// she comments on the step and asks for changes from her own browser; he answers and resolves; she
// approves; Lena Marsh (lead) reads the mails on the Outbox page; the review copy prints the thread.

const STEP = 'MeMgBr, THF';
const QUESTION = 'The ketone is free here: **which PG** protects it from the Grignard?';
const ANSWER = 'Good catch: a dioxolane goes on first, see the new step.';

const reviewBar = (page: Page) => page.getByRole('region', { name: 'Review' });

async function askForReview(page: Page) {
	await reviewBar(page).getByRole('button', { name: 'Ask for review' }).click();
	const dialog = page.getByRole('dialog', { name: 'Ask for review' });
	await dialog.getByLabel('Priya Vance').check();
	await dialog.getByRole('button', { name: 'Send request' }).click();
	await expect(reviewBar(page).getByText('Status: In review')).toBeVisible();
}

test('a route goes through review: request, comment, changes, reply, resolve, approval, mails, copy', async ({
	page,
	browser
}) => {
	test.slow(); // three people, two browsers, real SMTP to the local catcher
	const name = unique('Review story');
	await signInAndWait(page, 'chemist@example.com');
	const routeId = await makeRoute(page, name);

	// The chemist asks the reviewer.
	await page.goto(`/routes/${routeId}`);
	await expect(reviewBar(page).getByText('Status: Draft')).toBeVisible();
	await askForReview(page);

	// The reviewer, in a second browser context: a comment on the step, then a request for changes.
	const reviewer = await asUser(browser, 'reviewer');
	await reviewer.goto(`/routes/${routeId}`);
	await expect(reviewBar(reviewer).getByText('Status: In review')).toBeVisible();
	await reviewer.getByTestId('step-label').getByRole('button', { name: STEP }).click();
	await reviewer.getByRole('textbox', { name: 'Comment on this step' }).fill(QUESTION);
	await reviewer.getByRole('button', { name: 'Post comment' }).click();
	const posted = reviewer.getByRole('article', { name: 'Comment by Priya Vance' });
	await expect(posted).toContainText('which PG protects it from the Grignard?');
	await expect(posted.locator('strong')).toHaveText('which PG'); // Markdown, rendered
	await reviewBar(reviewer).getByRole('button', { name: 'Ask for changes' }).click();
	const changes = reviewer.getByRole('dialog');
	await changes.getByLabel('What should change?').fill('Protect the ketone before the Grignard.');
	await changes.getByRole('button', { name: 'Ask for changes' }).click();
	await expect(reviewBar(reviewer).getByText('Status: Changes requested')).toBeVisible();

	// The chemist sees the open comment on the step's edge, answers it and resolves it.
	await page.reload();
	await expect(reviewBar(page).getByText('Status: Changes requested')).toBeVisible();
	const count = page.getByRole('button', { name: '1 open comment' });
	await expect(count).toBeVisible();
	await count.click();
	await expect(page.getByRole('heading', { name: /^Step:/ })).toBeVisible();
	const question = page.getByRole('article', { name: 'Comment by Priya Vance' });
	await question.getByRole('button', { name: 'Reply' }).click();
	await page.getByRole('textbox', { name: 'Your reply' }).fill(ANSWER);
	await page.getByRole('button', { name: 'Post reply' }).click();
	await expect(page.getByRole('article', { name: 'Comment by Tomas Ridley' })).toContainText(
		'a dioxolane goes on first'
	);
	await expect(page.getByRole('button', { name: '2 open comments' })).toBeVisible();
	await question.getByRole('button', { name: 'Resolve' }).click();
	// Resolving the first comment closes the thread: the edge has no open comment left.
	await expect(page.getByRole('button', { name: /open comments?$/ })).toHaveCount(0);
	await askForReview(page);

	// The reviewer approves the version she read.
	await reviewer.reload();
	await reviewBar(reviewer).getByRole('button', { name: 'Approve' }).click();
	await expect(reviewBar(reviewer).getByText('Status: Approved')).toBeVisible();
	await expect(reviewer.getByTestId('approval')).toHaveText('Approved at version 1 by Priya Vance');
	await reviewer.context().close();

	// The lead reads the route's mails on the Outbox page, sent over SMTP to the local catcher.
	const lead = await asUser(browser, 'lead');
	const subjects = [
		`Review requested: “${name}”`,
		`New comment on “${name}”`,
		`Changes requested: “${name}”`,
		`Approved: “${name}”`
	];
	await expect(async () => {
		await lead.goto('/outbox');
		const rows = lead.getByTestId('outbox-row').filter({ hasText: name });
		for (const subject of subjects) {
			await expect(rows.filter({ hasText: subject }).first()).toContainText('Sent');
		}
		const received = lead.getByTestId('received-mail').filter({ hasText: name });
		await expect(received.filter({ hasText: `Approved: “${name}”` })).toHaveCount(1);
	}).toPass({ timeout: 30_000 });
	// The request went to the reviewer; the reviewer's comment and the verdicts to the chemist.
	const sentTo = (subject: string, email: string) =>
		lead
			.getByTestId('outbox-row')
			.filter({ hasText: subject })
			.filter({ has: lead.getByRole('cell', { name: email, exact: true }) });
	await expect(sentTo(`Review requested: “${name}”`, 'reviewer@example.com')).toHaveCount(2);
	await expect(sentTo(`New comment on “${name}”`, 'chemist@example.com')).toHaveCount(1);
	await expect(sentTo(`Approved: “${name}”`, 'chemist@example.com')).toHaveCount(1);
	await lead.context().close();

	// The review copy prints the thread, the reply and the approval.
	await page.goto(`/routes/${routeId}/report`);
	const copy = page.getByTestId('review-copy');
	await expect(copy).toContainText('which PG protects it from the Grignard?');
	await expect(copy).toContainText('a dioxolane goes on first');
	await expect(page.getByTestId('report-approval')).toContainText('Priya Vance');
});

test('a viewer reads the demo review (comments, status, copy) with nothing to write or act on', async ({
	browser
}) => {
	const viewer = await asUser(browser, 'viewer');
	const projects: { id: string; name: string }[] = (
		await (await viewer.request.get('/api/projects')).json()
	).projects;
	const petrel = projects.find((project) => project.name.startsWith('Petrel'))!;
	const routes: { id: string; name: string }[] = (
		await (await viewer.request.get(`/api/projects/${petrel.id}/routes`)).json()
	).routes;
	const demo = routes.find((route) => route.name === 'OG-2044 amide coupling');
	expect(demo, 'the demo scenario puts the amide coupling in review').toBeTruthy();
	await viewer.goto(`/routes/${demo!.id}`);
	await expect(reviewBar(viewer).getByText('Status: In review')).toBeVisible();
	await expect(reviewBar(viewer).getByRole('button')).toHaveCount(0);
	await viewer.getByRole('button', { name: '2 open comments' }).click();
	await expect(viewer.getByRole('article', { name: 'Comment by Priya Vance' })).toContainText(
		'Both partners carry a free OH'
	);
	await expect(viewer.getByText('as a viewer you cannot write them')).toBeVisible();
	await expect(viewer.getByRole('textbox')).toHaveCount(0);
	await expect(viewer.getByRole('button', { name: /^(Reply|Resolve|Edit)$/ })).toHaveCount(0);
	await viewer.goto(`/routes/${demo!.id}/report`);
	await expect(viewer.getByTestId('review-copy')).toContainText('86 % amide');
	expect((await viewer.goto('/outbox'))?.status()).toBe(403);
	await viewer.context().close();
});
