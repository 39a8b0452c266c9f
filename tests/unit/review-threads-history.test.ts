import { describe, expect, it } from 'vitest';
import type { CommentAnswer, ReviewHistoryEntry } from '../../src/lib/api/answers';
import { approvalOf, historySentence, printedDate } from '../../src/lib/review/history';
import { commentThreads, sortThreads } from '../../src/lib/review/threads';

const comment = (id: string, replyTo: string | null, stepId: string | null = 's1') =>
	({ id, replyTo, stepId, body: id, resolved: false }) as CommentAnswer;
const person = (name: string) => ({ id: name, name });
const entry = (over: Partial<ReviewHistoryEntry>): ReviewHistoryEntry => ({
	id: crypto.randomUUID(),
	action: 'approve',
	actor: person('Reviewer'),
	reviewers: [],
	note: null,
	version: 1,
	createdAt: '2026-12-01T09:00:00.000Z',
	...over
});

describe('comment threads', () => {
	it('puts replies to replies under the comment that began the conversation, oldest first', () => {
		const threads = commentThreads([
			comment('a', null),
			comment('x', null),
			comment('b', 'a'),
			comment('c', 'b')
		]);
		expect(threads.map((t) => [t.root.id, t.replies.map((r) => r.id)])).toEqual([
			['a', ['b', 'c']],
			['x', []]
		]);
	});

	it('starts a thread at a reply whose parent is gone, and stops at a loop', () => {
		const threads = commentThreads([comment('b', 'gone'), comment('p', 'q'), comment('q', 'p')]);
		expect(threads.map((t) => t.root.id)).toEqual(['b', 'p']);
		expect(threads[1]!.replies.map((r) => r.id)).toEqual(['q']);
	});

	it("sorts threads to the route's steps, the route itself, and steps since removed", () => {
		const sorted = sortThreads(
			[comment('a', null, 's1'), comment('r', null, null), comment('old', null, 'gone')],
			['s1', 's2']
		);
		expect(sorted.byStep.get('s1')!.map((t) => t.root.id)).toEqual(['a']);
		expect(sorted.byStep.has('s2')).toBe(false);
		expect(sorted.route.map((t) => t.root.id)).toEqual(['r']);
		expect(sorted.onRemovedSteps.map((t) => t.root.id)).toEqual(['old']);
	});
});

describe('review history in words', () => {
	it('says who did what to which version', () => {
		expect(
			historySentence(
				entry({
					action: 'request',
					actor: person('Chemist'),
					reviewers: [person('Reviewer'), person('Lead'), person('Viewer')]
				})
			)
		).toBe('Chemist asked Reviewer, Lead and Viewer to review version 1.');
		expect(historySentence(entry({ action: 'request-changes', version: 3 }))).toBe(
			'Reviewer asked for changes to version 3.'
		);
		expect(historySentence(entry({ actor: null }))).toBe('A former member approved version 1.');
	});

	it('takes the approver of the approved version from the latest approval of it', () => {
		const history = [
			entry({ version: 1, actor: person('Lead'), createdAt: '2026-12-01T09:00:00.000Z' }),
			entry({ action: 'returned-to-draft', version: 2 }),
			entry({ version: 3, actor: person('Reviewer'), createdAt: '2026-12-02T10:15:00.000Z' })
		];
		expect(approvalOf(3, history, 3)).toEqual({
			version: 3,
			by: person('Reviewer'),
			at: '2026-12-02T10:15:00.000Z',
			changedSince: false
		});
		expect(approvalOf(3, history, 5)?.changedSince).toBe(true);
		expect(approvalOf(null, history, 5)).toBeNull();
	});

	it('prints dates in UTC, the same on server and browser', () => {
		expect(printedDate('2026-12-04T05:07:00.000Z')).toBe('4 Dec 2026, 05:07 UTC');
	});
});
