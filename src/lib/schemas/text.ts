import { z } from 'zod';

/** C0 control characters and DEL, except tab, line feed and carriage return (molfiles need those). */
// eslint-disable-next-line no-control-regex -- finding control characters is the point
const CONTROL_CHARACTER = /[\u0000-\u0008\u000B\u000C\u000E-\u001F\u007F]/;

export const CONTROL_CHARACTER_MESSAGE =
	'Remove control characters (such as NUL); only tabs and line breaks are allowed in text.';

/**
 * Every free-text field of a form or API body starts here, e.g. `text().trim().max(120)`: a NUL
 * is refused with a message instead of reaching the database (PostgreSQL rejects it with a 500).
 */
export function text() {
	return z.string().refine((value) => !CONTROL_CHARACTER.test(value), CONTROL_CHARACTER_MESSAGE);
}
