import type { RouteDocument } from '../../src/lib/route/document';

/** A linear route i0 → i1 → … with steps s1, s2, …; e.g. `line(['CC=O', 'CCO'], ['NaBH4, MeOH'])`. */
export function line(
	structures: string[],
	reagents: string[],
	name = 'OG-2031 fragment'
): RouteDocument {
	return {
		name,
		intermediates: structures.map((structure, i) => ({ id: `i${i}`, structure })),
		steps: reagents.map((r, i) => ({
			id: `s${i + 1}`,
			from: [`i${i}`],
			to: `i${i + 1}`,
			reagents: r
		}))
	};
}
