import { describe, expect, it } from 'vitest';
import { safeRedirectTarget } from '../../src/lib/paths';

// The values as `url.searchParams.get('redirectTo')` hands them over, i.e. already percent-decoded.
const ORIGIN = 'http://localhost:4173';

/** Where a browser ends up when it follows `location: target` from a page on ORIGIN. */
const landing = (target: string) => new URL(target, ORIGIN);

describe('safeRedirectTarget', () => {
	it('keeps an in-app path with its query', () => {
		expect(safeRedirectTarget('/projects?x=1')).toBe('/projects?x=1');
		expect(safeRedirectTarget('/routes/abc#step-2')).toBe('/routes/abc#step-2');
	});

	const offSite = {
		'a tab after the first slash (/%09/evil.example)': '/\t/evil.example',
		'a newline after the first slash (/%0a/evil.example)': '/\n/evil.example',
		'a protocol-relative address': '//evil.example',
		'a backslash read as a slash': '/\\evil.example',
		'an encoded backslash after decoding': decodeURIComponent('/%5Cevil.example'),
		'an absolute address': 'https://evil.example',
		'a script address': 'javascript:alert(1)'
	};
	for (const [what, value] of Object.entries(offSite)) {
		it(`sends ${what} to the projects page`, () => {
			const target = safeRedirectTarget(value);
			expect(target).toBe('/projects');
			expect(landing(target).origin).toBe(ORIGIN);
		});
	}

	it('never returns a control character, which would make the redirect header throw (500)', () => {
		for (const value of ['%0a', '/projects\n', '/pro\rjects', '/a\u0000b']) {
			const target = safeRedirectTarget(value);
			// eslint-disable-next-line no-control-regex -- no control character may reach the header
			expect(target).not.toMatch(/[\u0000-\u001f]/);
			expect(() => new Headers({ location: target })).not.toThrow();
			expect(landing(target).origin).toBe(ORIGIN);
		}
	});

	it('falls back on nothing at all', () => {
		expect(safeRedirectTarget(null)).toBe('/projects');
		expect(safeRedirectTarget('')).toBe('/projects');
	});
});
