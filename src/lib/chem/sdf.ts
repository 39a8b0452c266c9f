// SDF records are split here rather than by openchemlib's SDFileParser so that a malformed record
// can be reported by number and the data fields come back as a plain object.

import { StructureError } from './errors';

export type SdfRecord = { molfile: string; fields: Record<string, string> };

/** Splits SDF text into records with their data fields, e.g. `splitSdf(text)[0].fields.ID` → `'OG-2031-01'`. */
export function splitSdf(text: string): SdfRecord[] {
	const chunks = text.replace(/\r\n?/g, '\n').split(/^\$\$\$\$[ \t]*$/m);
	const records: SdfRecord[] = [];
	chunks.forEach((chunk, index) => {
		// Later chunks start with the newline that ended the previous "$$$$" line; the first chunk's
		// leading newline is its (empty) title line and must stay.
		const body = index === 0 ? chunk : chunk.replace(/^\n/, '');
		if (body.trim() === '') {
			return;
		}
		const end = body.search(/^M {2}END[ \t]*$/m);
		if (end < 0) {
			throw new StructureError('sdf_syntax', `SDF record ${index + 1} has no "M  END" line.`, {
				record: index + 1
			});
		}
		const endOfLine = body.indexOf('\n', end);
		const molfile = endOfLine < 0 ? body : body.slice(0, endOfLine + 1);
		const rest = endOfLine < 0 ? '' : body.slice(endOfLine + 1);
		records.push({ molfile, fields: readDataFields(rest) });
	});
	if (records.length === 0) {
		throw new StructureError('sdf_syntax', 'The SDF text holds no records.');
	}
	return records;
}

function readDataFields(text: string): Record<string, string> {
	const fields: Record<string, string> = {};
	let name: string | null = null;
	let value: string[] = [];
	const flush = () => {
		if (name !== null) {
			fields[name] = value.join('\n').trim();
		}
		name = null;
		value = [];
	};
	for (const line of text.split('\n')) {
		const header = /^>.*?<([^>]+)>/.exec(line);
		if (header) {
			flush();
			name = header[1]!.trim();
		} else if (name !== null) {
			if (line.trim() === '') {
				flush();
			} else {
				value.push(line);
			}
		}
	}
	flush();
	return fields;
}
