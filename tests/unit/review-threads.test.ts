import { describe, expect, it } from 'vitest';
import type { CommentAnswer, ReviewHistoryEntry } from '../../src/lib/api/answers';
import { approvalText, historySentence, namesList } from '../../src/lib/review/history';
import {
	openCommentTotal,
	openCommentsLabel,
	openCountsByStep,
	threadsOf,
	threadsOnGoneSteps
} from '../../src/lib/review/threads';

let n = 0;
const c = (over: Partial<CommentAnswer>): CommentAnswer => ({
	id: `c${++n}`,
	stepId: 's1',
	replyTo: null,
	author: { id: 'u1', name: 'Ines Ferro' },
	body: 'x',
	html: '<p>x</p>',
	resolved: false,
	createdAt: '2026-12-01T09:00:00Z',
	editedAt: null,
	...over
});

describe('comment threads', () => {
	it('nests replies, and replies to replies, one level under the first comment', () => {
		const root = c({});
		const reply = c({ replyTo: root.id });
		const replyToReply = c({ replyTo: reply.id, stepId: null }); // its own stepId does not decide
		const other = c({ stepId: 's2' });
		const onRoute = c({ stepId: null });
		const all = [root, reply, replyToReply, other, onRoute];
		expect(threadsOf(all, 's1')).toEqual([{ root, replies: [reply, replyToReply] }]);
		expect(threadsOf(all, null)).toEqual([{ root: onRoute, replies: [] }]);
	});

	it('finds the threads on steps the route no longer has, and only those', () => {
		const gone = c({ stepId: 'deleted' });
		const reply = c({ replyTo: gone.id });
		const all = [gone, reply, c({ stepId: 's1' }), c({ stepId: null })];
		expect(threadsOnGoneSteps(all, new Set(['s1']))).toEqual([{ root: gone, replies: [reply] }]);
	});

	it('keeps a reply whose parent is gone as a thread of its own, and survives a reply loop', () => {
		const orphan = c({ replyTo: 'gone' });
		const a = c({ id: 'loop-a', replyTo: 'loop-b' });
		const b = c({ id: 'loop-b', replyTo: 'loop-a' });
		expect(threadsOf([orphan], 's1')).toEqual([{ root: orphan, replies: [] }]);
		expect(threadsOf([a, b], 's1').flatMap((t) => [t.root, ...t.replies])).toHaveLength(2);
	});

	it('counts open comments per step: not resolved, and not in a resolved thread', () => {
		const open = c({});
		const done = c({ resolved: true });
		const comments = [
			open,
			c({ replyTo: open.id }),
			c({ replyTo: open.id, resolved: true }),
			done,
			c({ replyTo: done.id }),
			c({ stepId: 's2' }),
			c({ stepId: null })
		];
		expect(Object.fromEntries(openCountsByStep(comments))).toEqual({ s1: 2, s2: 1 });
		// The route's total (the project table's column) adds the route's own thread.
		expect(openCommentTotal(comments)).toBe(4);
		expect(openCommentsLabel(1)).toBe('1 open comment');
		expect(openCommentsLabel(2)).toBe('2 open comments');
	});
});

const e = (over: Partial<ReviewHistoryEntry>): ReviewHistoryEntry => ({
	id: 'e',
	action: 'approve',
	actor: { id: 'u1', name: 'Ines Ferro' },
	reviewers: [],
	note: null,
	version: 4,
	createdAt: '2026-12-01T09:00:00Z',
	...over
});

describe('review words', () => {
	it('lists names as a sentence does', () => {
		const p = (name: string) => ({ id: name, name });
		expect(namesList([])).toBe('');
		expect(namesList([p('Ada')])).toBe('Ada');
		expect(namesList([p('Ada'), p('Bo')])).toBe('Ada and Bo');
		expect(namesList([p('Ada'), p('Bo'), p('Cy')])).toBe('Ada, Bo and Cy');
	});

	it('says who asked whom, and who asked without naming anyone', () => {
		const asked = e({ action: 'request', reviewers: [{ id: 'u2', name: 'Bo Lind' }] });
		expect(historySentence(asked)).toBe('Ines Ferro asked Bo Lind to review version 4.');
		expect(historySentence(e({ action: 'request' }))).toBe(
			'Ines Ferro asked for a review of version 4.'
		);
		expect(historySentence(e({ action: 'withdraw', actor: null }))).toBe(
			'A former member withdrew the review request (version 4).'
		);
	});

	it('names the approver of the approved version, not of an older approval', () => {
		const history = [
			e({ version: 2, actor: { id: 'u3', name: 'Old Approver' } }),
			e({ action: 'returned-to-draft', version: 3 }),
			e({ version: 4 })
		];
		expect(approvalText({ status: 'approved', version: 4, approvedVersion: 4, history })).toBe(
			'Approved at version 4 by Ines Ferro'
		);
	});

	it('says an approved route has changed since, and where it stands now', () => {
		const base = { version: 6, approvedVersion: 4, history: [e({})] };
		expect(approvalText({ ...base, status: 'draft' })).toBe(
			'Version 4 was approved; the route has changed since (now version 6) and is back in draft'
		);
		expect(approvalText({ ...base, status: 'in-review' })).toMatch(/and is in review again$/);
		expect(approvalText({ ...base, status: 'draft', approvedVersion: null })).toBeNull();
	});
});
