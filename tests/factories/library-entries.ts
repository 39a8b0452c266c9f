// Saved-condition answers as GET /api/library sends them, for the library screens' tests.

import type { SavedConditionAnswer } from '../../src/lib/api/answers';

let serial = 0;
/** The team every entry belongs to unless a test says otherwise. */
export const LIBRARY_TEAM = '00000000-0000-4000-8000-000000000001';

/** One entry with plausible defaults, changed by `over`; ids are real uuids. */
export function libraryEntry(over: Partial<SavedConditionAnswer> = {}): SavedConditionAnswer {
	serial += 1;
	return {
		id: crypto.randomUUID(),
		teamId: LIBRARY_TEAM,
		protectingGroup: 'TBS',
		kind: 'install',
		reagents: `TBSCl, imidazole (${serial})`,
		conditions: [],
		hazards: [],
		unrecognized: [],
		solvent: 'DMF',
		temperature: 'rt',
		time: '2 h',
		scale: '1 g',
		yield: 90,
		reference: `notebook OG-${serial}`,
		notes: null,
		author: { id: '00000000-0000-4000-8000-000000000002', name: 'Ada Chemist' },
		approved: false,
		retired: false,
		uses: 0,
		createdAt: '2026-12-01T10:00:00.000Z',
		updatedAt: '2026-12-01T10:00:00.000Z',
		...over
	};
}
