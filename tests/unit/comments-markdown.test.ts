import { JSDOM } from 'jsdom';
import { marked } from 'marked';
import { describe, expect, it } from 'vitest';
import { renderMarkdown } from '../../src/lib/server/markdown';

// A comment's Markdown must come out inert (issue 15: "script, event handlers and javascript:
// links never survive") and ordinary Markdown must survive. The payloads follow the OWASP XSS
// Filter Evasion Cheat Sheet (from memory): script tags, event handlers on img/svg, javascript:
// links in mixed case and hidden behind character references or a tab, data: URLs, iframes,
// object, style attributes. Each is first shown to be live in marked's raw output, so the checker
// below is known to see it; then shown inert after renderMarkdown. (Attribute values with quotes
// in them are quoted: unquoted, CommonMark does not read them as a tag and marked escapes them.)

const PAYLOADS: Record<string, string> = {
	'script tag': "<script>alert('XSS')</script>",
	'img onerror': `<IMG SRC=x onerror="alert('XSS')">`,
	'svg onload': `<svg onload="alert('XSS')">`,
	'javascript: link': "[click](javascript:alert('XSS'))",
	'JaVaScRiPt: link': "[click](JaVaScRiPt:alert('XSS'))",
	'jav&#x61;script: link': "[click](jav&#x61;script:alert('XSS'))",
	'decimal references, raw HTML':
		'<a href="&#106;&#97;&#118;&#97;&#115;&#99;&#114;&#105;&#112;&#116;&#58;alert(1)">click</a>',
	'tab inside the scheme': '<a href="jav&#x09;ascript:alert(1)">click</a>',
	'javascript: autolink': "<javascript:alert('XSS')>",
	'data: link': '[click](data:text/html;base64,PHNjcmlwdD5hbGVydCgnWFNTJyk8L3NjcmlwdD4=)',
	'data: image': '![x](data:image/svg+xml;base64,PHN2ZyBvbmxvYWQ9YWxlcnQoMSk+)',
	iframe: '<iframe src="javascript:alert(1)"></iframe>',
	object: '<object data="javascript:alert(1)"></object>',
	'style attribute': '<p style="background-image: url(javascript:alert(1))">styled</p>',
	'event handler on an allowed tag': '<a href="https://example.org" onmouseover="alert(1)">x</a>',
	'form action': '<form action="javascript:alert(1)"><button>go</button></form>'
};

const LIVE_TAGS = new Set(['script', 'iframe', 'object', 'embed', 'svg', 'img', 'style', 'form']);
const URL_ATTRIBUTES = new Set(['href', 'src', 'data', 'action', 'formaction']);
const SAFE_PROTOCOLS = new Set(['http:', 'https:', 'mailto:']);

/** What in this HTML could run or load: read as a browser reads it (jsdom decodes references). */
function liveParts(html: string): string[] {
	const { document } = new JSDOM('').window;
	const root = document.createElement('div');
	root.innerHTML = html;
	const found: string[] = [];
	for (const element of root.querySelectorAll('*')) {
		const tag = element.tagName.toLowerCase();
		if (LIVE_TAGS.has(tag)) {
			found.push(`<${tag}>`);
		}
		for (const { name, value } of element.attributes) {
			if (name.startsWith('on') || name === 'style') {
				found.push(`${tag}[${name}]`);
			} else if (URL_ATTRIBUTES.has(name)) {
				const protocol = new URL(value, 'https://orthogon.invalid/').protocol;
				if (!SAFE_PROTOCOLS.has(protocol)) {
					found.push(`${tag}[${name}=${protocol}]`);
				}
			}
		}
	}
	return found;
}

describe('comment Markdown: XSS payloads rendered inert', () => {
	for (const [name, payload] of Object.entries(PAYLOADS)) {
		it(`${name}: live in marked's own output, inert after renderMarkdown`, () => {
			const raw = marked.parse(payload, { async: false, gfm: true, breaks: true });
			expect(liveParts(raw)).not.toEqual([]);
			expect(liveParts(renderMarkdown(payload))).toEqual([]);
		});
	}

	it('shows a script as text rather than dropping it silently', () => {
		expect(renderMarkdown('<script>alert(1)</script>')).toBe(
			'&lt;script&gt;alert(1)&lt;/script&gt;'
		);
	});

	it('keeps the link text when it removes a javascript: target', () => {
		const { document } = new JSDOM(renderMarkdown('[click](JaVaScRiPt:alert(1))')).window;
		expect(document.body.textContent).toBe('click');
		expect(document.querySelector('a')?.hasAttribute('href') ?? false).toBe(false);
	});
});

describe('comment Markdown: what must survive', () => {
	it('bold, emphasis and strike-through', () => {
		expect(renderMarkdown('**TBAF** then _AcOH_, not ~~HF~~')).toBe(
			'<p><strong>TBAF</strong> then <em>AcOH</em>, not <del>HF</del></p>'
		);
	});

	it('lists, ordered ones keeping their start', () => {
		expect(renderMarkdown('- TBSCl\n- imidazole')).toBe(
			'<ul>\n<li>TBSCl</li>\n<li>imidazole</li>\n</ul>'
		);
		expect(renderMarkdown('3. quench\n4. extract')).toBe(
			'<ol start="3">\n<li>quench</li>\n<li>extract</li>\n</ol>'
		);
	});

	it('inline code and code blocks, with markup inside shown as text', () => {
		expect(renderMarkdown('Use `<script>` nowhere')).toBe(
			'<p>Use <code>&lt;script&gt;</code> nowhere</p>'
		);
		expect(renderMarkdown('```\nC[Si](C)(C)Cl\n```')).toBe(
			'<pre><code>C[Si](C)(C)Cl\n</code></pre>'
		);
	});

	it('http(s) and mailto links, opened without giving the page a handle on ours', () => {
		const html = renderMarkdown(
			'See [the SDS](https://example.org/sds "SDS") or <lab@example.org>'
		);
		const { document } = new JSDOM(html).window;
		const [sds, mail] = [...document.querySelectorAll('a')];
		expect(sds?.getAttribute('href')).toBe('https://example.org/sds');
		expect(sds?.getAttribute('title')).toBe('SDS');
		expect(sds?.getAttribute('rel')?.split(' ')).toContain('noopener');
		expect(mail?.getAttribute('href')).toBe('mailto:lab@example.org');
	});

	it('line breaks, quotes and headings', () => {
		expect(renderMarkdown('dry\nthen weigh')).toBe('<p>dry<br />then weigh</p>');
		expect(renderMarkdown('> quoted')).toBe('<blockquote>\n<p>quoted</p>\n</blockquote>');
		expect(renderMarkdown('## Workup')).toBe('<h2>Workup</h2>');
	});
});
