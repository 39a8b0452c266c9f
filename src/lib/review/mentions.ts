// Who a comment @mentions. Pure: no server or framework imports, so a page could highlight the
// same mentions the server mails. Markdown is read with marked's lexer, so code (inline or in a
// block, fenced or indented) and escaped `\@` are told apart exactly as the renderer tells them.

import { marked, type Token } from 'marked';

/** A teammate who could be mentioned. */
export type Mentionable = { id: string; name: string; email: string };

// A character that may sit in an e-mail's local part: an `@` right after one is an address
// (`a@b.org`), not a mention.
const ADDRESS_CHARACTER = /[\p{L}\p{N}_.+-]/u;
// A mention ends where the handle does: not inside a longer word (`@Miranda` is not `@Mira`), and
// not before a dot or hyphen that continues it (`@mira.c` is not `@mira`); a full stop, a comma
// or an apostrophe (`@Mira Castellan's`) after it is fine.
const CONTINUES_WORD = /^(?:[\p{L}\p{N}_]|[.-][\p{L}\p{N}_])/u;

/** The prose of a Markdown body, one piece per text token; code and escaped characters left out. */
function proseOf(body: string): string[] {
	const pieces: string[] = [];
	// walkTokens returns the callbacks' results; ours is synchronous, so there is nothing to await.
	void marked.walkTokens(marked.lexer(body, { gfm: true }), (token: Token) => {
		// Leaf text only: a text token with children is visited again through them.
		if (token.type === 'text' && !('tokens' in token && token.tokens?.length)) {
			pieces.push(token.text);
		}
	});
	return pieces;
}

/** A pattern for one handle at one position: case-insensitive, any run of spaces as a space. */
function handlePattern(handle: string): RegExp {
	const escaped = handle
		.trim()
		.replace(/[.*+?^${}()|[\]\\]/g, '\\$&')
		.replace(/\s+/g, '\\s+');
	return new RegExp(escaped, 'iuy');
}

type Handle = { person: Mentionable; pattern: RegExp };

function handlesOf(people: Mentionable[]): Handle[] {
	return people.flatMap((person) => {
		const localPart = person.email.split('@')[0] ?? '';
		return [person.name, localPart]
			.filter((handle) => handle.trim().length > 0)
			.map((handle) => ({ person, pattern: handlePattern(handle) }));
	});
}

/** The person mentioned by the `@` at `at`, the longest handle winning; null if none fits. */
function mentionAt(text: string, at: number, handles: Handle[]): Mentionable | null {
	let best: { person: Mentionable; length: number } | null = null;
	for (const { person, pattern } of handles) {
		pattern.lastIndex = at + 1;
		const match = pattern.exec(text);
		if (!match) {
			continue;
		}
		const end = at + 1 + match[0].length;
		if (CONTINUES_WORD.test(text.slice(end, end + 2))) {
			continue;
		}
		if (!best || match[0].length > best.length) {
			best = { person, length: match[0].length };
		}
	}
	return best?.person ?? null;
}

/**
 * The people a comment mentions, each once, in the order first mentioned: `@` and a full name
 * (`@Mira Castellan`) or an e-mail's local part (`@mira.castellan`), any case, outside code.
 * E.g. `mentionedIn('Ask @mira.castellan', team)` → `[Mira Castellan]`.
 */
export function mentionedIn(body: string, people: Mentionable[]): Mentionable[] {
	const handles = handlesOf(people);
	const found = new Map<string, Mentionable>();
	for (const text of proseOf(body)) {
		for (let at = text.indexOf('@'); at !== -1; at = text.indexOf('@', at + 1)) {
			if (at > 0 && ADDRESS_CHARACTER.test(text[at - 1]!)) {
				continue;
			}
			const person = mentionAt(text, at, handles);
			if (person && !found.has(person.id)) {
				found.set(person.id, person);
			}
		}
	}
	return [...found.values()];
}
