import { marked } from 'marked';
import sanitizeHtml from 'sanitize-html';

// Comments are Markdown, rendered by marked and then sanitised by sanitize-html: marked passes raw
// HTML through, so the sanitiser is the only gate. It keeps a short list of text tags, links only
// to http(s) and mailto, and no attributes that run code (no on*, no style, no javascript: URLs).
const SANITIZE: sanitizeHtml.IOptions = {
	allowedTags: [
		'p',
		'br',
		'strong',
		'em',
		'del',
		'code',
		'pre',
		'blockquote',
		'ul',
		'ol',
		'li',
		'a',
		'h1',
		'h2',
		'h3',
		'h4',
		'hr',
		'sub',
		'sup',
		'table',
		'thead',
		'tbody',
		'tr',
		'th',
		'td'
	],
	allowedAttributes: { a: ['href', 'title', 'rel'], ol: ['start'] },
	allowedSchemes: ['http', 'https', 'mailto'],
	allowProtocolRelative: false,
	disallowedTagsMode: 'escape',
	transformTags: {
		a: sanitizeHtml.simpleTransform('a', { rel: 'noopener noreferrer nofollow' })
	}
};

/** A comment's Markdown as safe HTML, e.g. `**TBAF**` → `<p><strong>TBAF</strong></p>`. */
export function renderMarkdown(body: string): string {
	const html = marked.parse(body, { async: false, gfm: true, breaks: true });
	return sanitizeHtml(html, SANITIZE).trim();
}
