import type { z } from 'zod';
import { ApiFailure } from './api';

/** The field an issue is about, e.g. `yield`, or `body` for the body as a whole. */
export function fieldOf(issue: z.core.$ZodIssue): string {
	return issue.path.map(String).join('.') || 'body';
}

/**
 * Parses a body whose refusals must name the field: 422 `invalid_field` with the first issue's
 * field in the message and in `details: { field }` (`readJson` alone answers 400 for any shape).
 */
export function parseFields<S extends z.ZodType>(schema: S, body: unknown): z.output<S> {
	const parsed = schema.safeParse(body);
	if (parsed.success) {
		return parsed.data;
	}
	const issue = parsed.error.issues[0]!;
	const field = fieldOf(issue);
	throw new ApiFailure(422, 'invalid_field', `${field}: ${issue.message}`, { field });
}
