// The `highlight` field of /api/analyze: which atoms to shade in the drawing.
//
// Grammar: a comma-separated list; each item is a 0-based atom index ("3"), a free-group id
// ("ketone", "diol-1,2") or a protecting-group id ("TBS"). An id highlights every instance of it.
// Group ids that themselves contain a comma ("diol-1,2") are recognised before splitting. A retired
// id (group-aliases.ts: "aryl-halide") highlights every instance of the groups it was split into.

import { StructureError } from './errors';
import type { Perception } from './perceive';
import { FREE_GROUP_ALIASES } from './group-aliases';

/** Atoms named by a highlight spec, e.g. `highlightAtoms('TBS,4', perception, 20)` → `[4, 7, 8, …]`. */
export function highlightAtoms(spec: string, perception: Perception, atomCount: number): number[] {
	const atoms = new Set<number>();
	const byId = new Map<string, number[][]>();
	for (const item of [...perception.groups, ...perception.protectingGroups]) {
		byId.set(item.id, [...(byId.get(item.id) ?? []), item.atoms]);
	}
	for (const [alias, ids] of Object.entries(FREE_GROUP_ALIASES)) {
		const sets = ids.flatMap((id) => byId.get(id) ?? []);
		if (sets.length > 0) {
			byId.set(alias, sets);
		}
	}
	const knownIds = [...byId.keys()].sort((a, b) => b.length - a.length);
	let rest = spec.trim();
	while (rest !== '') {
		const id = knownIds.find((candidate) => rest === candidate || rest.startsWith(`${candidate},`));
		let item: string;
		if (id) {
			item = id;
			for (const set of byId.get(id)!) {
				set.forEach((atom) => atoms.add(atom));
			}
		} else {
			item = rest.split(',')[0]!.trim();
			if (!/^\d+$/.test(item) || Number(item) >= atomCount) {
				throw new StructureError(
					'invalid_highlight',
					`Cannot highlight "${item}": name an atom index from 0 to ${atomCount - 1}, or a group or protecting group found in this structure.`
				);
			}
			atoms.add(Number(item));
		}
		rest = rest.slice(item.length).replace(/^\s*,\s*/, '');
	}
	return [...atoms].sort((a, b) => a - b);
}
