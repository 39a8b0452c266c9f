/**
 * Load errors for the rule table: every problem names the file, the path inside it and the
 * reason, e.g. `rules/reagents.json: [12].conditions[0]: unknown condition id "acid-stronk" (…)`.
 */
import type { z } from 'zod';

/** A path inside a JSON file as people read it, e.g. `[12, 'conditions', 0]` → `[12].conditions[0]`. */
export function formatPath(path: readonly PropertyKey[]): string {
	if (path.length === 0) {
		return '(top level)';
	}
	let out = '';
	for (const key of path) {
		if (typeof key === 'number') {
			out += `[${key}]`;
		} else {
			out += out === '' ? String(key) : `.${String(key)}`;
		}
	}
	return out;
}

/** One line per problem, e.g. `formatIssue('rules/x.json', [0, 'id'], 'missing id')`. */
export function formatIssue(file: string, path: readonly PropertyKey[], reason: string): string {
	return `${file}: ${formatPath(path)}: ${reason}`;
}

/** zod's issues as lines, e.g. `formatZodIssues('rules/reagents.json', result.error)`. */
export function formatZodIssues(file: string, error: z.ZodError): string[] {
	return error.issues.map((issue) => {
		const reason =
			issue.code === 'unrecognized_keys' && issue.message.startsWith('Unrecognized key')
				? `unknown field ${issue.keys.map((key) => JSON.stringify(key)).join(', ')}`
				: issue.message;
		return formatIssue(file, issue.path, reason);
	});
}

/** Thrown when a rule file (or an override layer) is invalid; `problems` holds one line each. */
export class RuleTableError extends Error {
	readonly problems: readonly string[];

	constructor(problems: readonly string[]) {
		const shown = problems.slice(0, 20);
		const more =
			problems.length > shown.length ? `\n… and ${problems.length - shown.length} more` : '';
		super(`The rule table did not load:\n${shown.join('\n')}${more}`);
		this.name = 'RuleTableError';
		this.problems = problems;
	}
}

/** Where each rule file lives, as error messages name it. */
export const RULE_FILES = {
	conditions: 'rules/conditions.json',
	reagents: 'rules/reagents.json',
	reactivity: 'rules/reactivity.json',
	protectingGroups: 'rules/protecting-groups.json',
	preferences: 'rules/preferences.json'
} as const;
