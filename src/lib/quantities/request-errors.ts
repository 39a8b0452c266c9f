// A refused request body in words that name the material or field, e.g.
// "ethylene glycol (materials[1].volume): A volume must be greater than zero."

import type { z } from 'zod';

function where(issue: z.core.$ZodIssue, body: unknown): string {
	const path = issue.path
		.map((key, i) => (typeof key === 'number' ? `[${key}]` : `${i === 0 ? '' : '.'}${String(key)}`))
		.join('');
	const [list, index] = issue.path;
	if (list === 'materials' && typeof index === 'number') {
		const rows = (body as { materials?: unknown })?.materials;
		const name = Array.isArray(rows) ? (rows[index] as { name?: unknown })?.name : undefined;
		if (typeof name === 'string' && name.trim() !== '') {
			return `${name.trim().slice(0, 80)} (${path})`;
		}
	}
	return path === '' ? 'The body' : path;
}

/** The first issue as one sentence, e.g. for a zero mass on row 1: "hexanol (materials[0].mass): …". */
export function describeIssues(error: z.ZodError, body: unknown): string {
	const first = error.issues[0];
	return first ? `${where(first, body)}: ${first.message}` : 'The request body is not valid.';
}
