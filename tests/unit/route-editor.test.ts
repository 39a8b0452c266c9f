import { afterEach, beforeEach, describe, expect, it, vi } from 'vitest';
import { RouteEditor } from '../../src/lib/components/route-map/route-editor.svelte';
import { selectionFromCanvas } from '../../src/lib/components/route-map/flow';
import type { RouteClient } from '../../src/lib/client/route-client';
import { Toasts } from '../../src/lib/client/toasts.svelte';
import type { RouteDocument } from '../../src/lib/route/document';

const doc: RouteDocument = {
	name: 'OG-2031',
	intermediates: [
		{ id: 'a', structure: 'CC(=O)CCC(=O)OC', position: { x: 0, y: 0 } },
		{ id: 'b', structure: 'CC(=O)CCC(C)(C)O', position: { x: 320, y: 0 } }
	],
	steps: [{ id: 's1', from: ['a'], to: 'b' }]
};

type Answer =
	| { ok: true; status: 200; data: { version: number } }
	| { ok: false; status: number; code: string; message: string };
let answers: Answer[];
let release: (() => void) | null;
const client = {
	save: vi.fn(async (): Promise<Answer> => {
		if (release === null) {
			return answers.shift()!;
		}
		await new Promise<void>((resolve) => (release = resolve));
		return answers.shift()!;
	}),
	create: vi.fn(async () => 'copy-id'),
	load: vi.fn(async () => ({
		ok: true,
		status: 200,
		data: {
			id: 'r',
			projectId: 'p',
			name: 'theirs',
			status: 'draft',
			version: 5,
			document: { ...doc, name: 'Theirs' }
		}
	})),
	check: vi.fn(async () => ({ ok: true, status: 200, data: new Map() })),
	analyze: vi.fn()
};
const labels = { conditions: [], groups: new Map(), protectingGroups: new Map() };

const make = (canEdit = true) =>
	new RouteEditor(
		{ routeId: 'r', projectId: 'p', version: 1, document: doc, canEdit, analyses: {}, labels },
		client as unknown as RouteClient,
		new Toasts()
	);
const ok = (version: number): Answer => ({ ok: true, status: 200, data: { version } });

beforeEach(() => {
	vi.useFakeTimers();
	vi.clearAllMocks();
	answers = [];
	release = null;
});
afterEach(() => vi.useRealTimers());

describe('route editor autosave', () => {
	it('saves once after typing stops, with the version it holds, then moves to the new version', async () => {
		const editor = make();
		answers = [ok(2)];
		editor.updateStep('s1', { reagents: 'MeMg' }, 'reagents');
		editor.updateStep('s1', { reagents: 'MeMgBr, THF' }, 'reagents');
		expect(editor.saveState).toBe('pending');
		await vi.advanceTimersByTimeAsync(1000);
		expect(client.save).toHaveBeenCalledTimes(1);
		expect(client.save).toHaveBeenCalledWith('r', 1, {
			...doc,
			steps: [{ id: 's1', from: ['a'], to: 'b', reagents: 'MeMgBr, THF' }]
		});
		expect(editor.version).toBe(2);
		expect(editor.saveState).toBe('saved');
		expect(client.check).toHaveBeenCalled();
	});

	it('sends edits made during a save in a second save with the new version', async () => {
		const editor = make();
		answers = [ok(2), ok(3)];
		release = () => undefined;
		editor.rename('First');
		await vi.advanceTimersByTimeAsync(1000);
		editor.rename('Second');
		await vi.advanceTimersByTimeAsync(1000);
		expect(client.save).toHaveBeenCalledTimes(1);
		const finish = release as () => void;
		release = null;
		finish();
		await vi.advanceTimersByTimeAsync(1000);
		expect(client.save).toHaveBeenCalledTimes(2);
		expect(client.save.mock.calls[1]).toEqual(['r', 2, { ...doc, name: 'Second' }]);
		expect(editor.saveState).toBe('saved');
	});

	it('on a conflict stops saving, keeps every edit, and can keep them as a copy', async () => {
		const editor = make();
		answers = [{ ok: false, status: 409, code: 'version_conflict', message: 'changed' }];
		editor.rename('Mine');
		await vi.advanceTimersByTimeAsync(1000);
		expect(editor.saveState).toBe('conflict');
		editor.updateStep('s1', { reagents: 'typed after the conflict' }, 'reagents');
		await vi.advanceTimersByTimeAsync(5000);
		expect(client.save).toHaveBeenCalledTimes(1);
		expect(await editor.keepMineAsCopy()).toBe('copy-id');
		expect(client.create).toHaveBeenCalledWith('p', {
			...doc,
			name: 'Mine (my copy)',
			steps: [{ id: 's1', from: ['a'], to: 'b', reagents: 'typed after the conflict' }]
		});
	});

	it('on a conflict can load their version instead', async () => {
		const editor = make();
		answers = [{ ok: false, status: 409, code: 'version_conflict', message: 'changed' }];
		editor.rename('Mine');
		await vi.advanceTimersByTimeAsync(1000);
		await editor.loadTheirs();
		expect(editor.doc.name).toBe('Theirs');
		expect(editor.version).toBe(5);
		expect(editor.saveState).toBe('saved');
		expect(editor.canUndo).toBe(false);
	});

	it('keeps a failed save pending for a retry instead of dropping it', async () => {
		const editor = make();
		answers = [{ ok: false, status: 0, code: 'network', message: 'offline' }, ok(2)];
		editor.rename('Offline edit');
		await vi.advanceTimersByTimeAsync(1000);
		expect(editor.saveState).toBe('failed');
		expect(editor.hasUnsaved).toBe(true);
		await editor.saveNow();
		expect(client.save.mock.calls[1]).toEqual(['r', 1, { ...doc, name: 'Offline edit' }]);
		expect(editor.saveState).toBe('saved');
	});
});

describe('route editor flush (before the planner reads the stored route)', () => {
	it('waits for a save on its way and sends edits made meanwhile, then reports the route stored', async () => {
		const editor = make();
		answers = [ok(2), ok(3)];
		release = () => undefined;
		editor.rename('First');
		await vi.advanceTimersByTimeAsync(1000);
		editor.rename('Second');
		let stored: boolean | null = null;
		void editor.flush().then((done) => (stored = done));
		await vi.advanceTimersByTimeAsync(0);
		expect(stored).toBeNull();
		const finish = release as () => void;
		release = null;
		finish();
		await vi.advanceTimersByTimeAsync(0);
		expect(stored).toBe(true);
		expect(client.save).toHaveBeenCalledTimes(2);
		expect(client.save.mock.calls[1]).toEqual(['r', 2, { ...doc, name: 'Second' }]);
		expect(editor.version).toBe(3);
	});

	it('reports false on a conflict or a failed save, and true at once with nothing to send', async () => {
		const conflicted = make();
		answers = [{ ok: false, status: 409, code: 'version_conflict', message: 'changed' }];
		conflicted.rename('Mine');
		expect(await conflicted.flush()).toBe(false);
		const offline = make();
		answers = [{ ok: false, status: 0, code: 'network', message: 'offline' }];
		offline.rename('Offline');
		expect(await offline.flush()).toBe(false);
		expect(await make().flush()).toBe(true);
		expect(await make(false).flush()).toBe(true);
		expect(client.save).toHaveBeenCalledTimes(2);
	});
});

describe('route editor undo and roles', () => {
	it('undoes a burst of typing in one field as one edit', () => {
		const editor = make();
		for (const text of ['M', 'Me', 'MeMgBr']) {
			editor.updateStep('s1', { reagents: text }, 'reagents');
		}
		editor.connect('b', 'a');
		expect(editor.doc.steps[0]!.reagents).toBe('MeMgBr');
		editor.undo();
		expect(editor.doc).toEqual(doc);
	});

	it('changes nothing for a reviewer or viewer', async () => {
		const editor = make(false);
		editor.rename('Not allowed');
		editor.remove(['a']);
		await vi.advanceTimersByTimeAsync(1000);
		expect(editor.doc).toBe(doc);
		expect(client.save).not.toHaveBeenCalled();
	});
});

describe('one selection', () => {
	it('is cleared when the selected item leaves the document, by delete or by undo', () => {
		const editor = make();
		editor.select({ kind: 'step', id: 's1' });
		editor.remove(['a']);
		expect(editor.doc.steps).toEqual([]);
		expect(editor.selection).toBeNull();
		const id = editor.addIntermediate('CCO', 'ethanol');
		expect(editor.selection).toEqual({ kind: 'intermediate', id });
		editor.undo();
		expect(editor.selection).toBeNull();
	});

	it('looks items up by id in the document as it is now', () => {
		const editor = make();
		expect(editor.document.intermediate('b')?.structure).toBe('CC(=O)CCC(C)(C)O');
		editor.updateIntermediate('b', { label: 'tertiary alcohol' });
		expect(editor.document.intermediate('b')?.label).toBe('tertiary alcohol');
		expect(editor.document.step('s1')?.to).toBe('b');
		editor.remove([], [], ['s1']);
		expect(editor.document.step('s1')).toBeUndefined();
	});

	it('takes what the canvas selects: the current item while it stays selected, else the first', () => {
		const current = { kind: 'step', id: 's1' } as const;
		const edge = { data: { stepId: 's1', from: 'a', primary: true } };
		expect(selectionFromCanvas([{ id: 'a' }], [edge], current)).toBe(current);
		expect(selectionFromCanvas([{ id: 'a' }], [], current)).toEqual({
			kind: 'intermediate',
			id: 'a'
		});
		expect(selectionFromCanvas([], [edge], null)).toEqual({ kind: 'step', id: 's1' });
		expect(selectionFromCanvas([], [], current)).toBeNull();
	});
});
