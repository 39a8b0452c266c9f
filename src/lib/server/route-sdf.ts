// SDF is how routes leave and enter Orthogon for other chemistry software: one record per
// intermediate, in route order, with the incoming step carried as data fields. The route document
// stays the lossless form; SDF keeps what a flat list of molecules can hold.

import { FIELD_LIMITS } from '../schemas/limits';
import { detectFormat, isStructureError, readStructure, splitSdf } from '../chem';
import {
	STEP_INTENTS,
	validateRouteDocument,
	type RouteDocument,
	type RouteIntermediate,
	type RouteStep
} from '../route/document';

/** Why an import or export was refused, naming the record (1-based) when one record is to blame. */
export class RouteFileError extends Error {
	constructor(
		message: string,
		readonly record?: number,
		readonly details?: unknown,
		/** Why a structure was refused (a StructureErrorCode such as `too_large`), when one was. */
		readonly reason?: string
	) {
		super(message);
		this.name = 'RouteFileError';
	}
}

/** Intermediates ordered so every step's inputs come before its product (document order otherwise). */
export function routeOrder(doc: RouteDocument): RouteIntermediate[] {
	const incoming = new Map<string, string[]>();
	for (const step of doc.steps) {
		incoming.set(step.to, [...(incoming.get(step.to) ?? []), ...step.from]);
	}
	const placed = new Set<string>();
	const ordered: RouteIntermediate[] = [];
	const visit = (node: RouteIntermediate, trail: Set<string>) => {
		if (placed.has(node.id) || trail.has(node.id)) {
			return;
		}
		trail.add(node.id);
		for (const from of incoming.get(node.id) ?? []) {
			const input = doc.intermediates.find((n) => n.id === from);
			if (input) {
				visit(input, trail);
			}
		}
		placed.add(node.id);
		ordered.push(node);
	};
	for (const node of doc.intermediates) {
		visit(node, new Set());
	}
	return ordered;
}

/** The molfile block of a stored structure: molfiles keep their drawn coordinates, SMILES get new ones. */
function molfileOf(node: RouteIntermediate): string {
	const format = detectFormat(node.structure);
	let block: string;
	if (format === 'sdf') {
		block = splitSdf(node.structure)[0]!.molfile;
	} else if (format === 'smiles') {
		block = readStructure(node.structure, { coordinates: true }).molecule.toMolfile();
	} else {
		block = node.structure.replace(/\r\n?/g, '\n');
	}
	const lines = block.split('\n');
	// The first line of a molfile is its title: the label, so other programs show a name.
	lines[0] = (node.label ?? node.id).replace(/[\r\n]/g, ' ').slice(0, 80);
	const text = lines.join('\n');
	return text.endsWith('\n') ? text : `${text}\n`;
}

const NO_STEP = 'none';

function field(name: string, value: string | undefined): string {
	if (value === undefined || value.trim() === '') {
		return '';
	}
	// A blank line ends a data field's value, so blank lines inside notes are closed up.
	return `>  <${name}>\n${value
		.replace(/\r\n?/g, '\n')
		.replace(/\n\s*\n/g, '\n')
		.trim()}\n\n`;
}

/** The route as SDF text, e.g. `routeToSdf(doc).split('$$$$').length - 1 === doc.intermediates.length`. */
export function routeToSdf(doc: RouteDocument): string {
	const firstStepInto = new Map<string, RouteStep>();
	for (const step of doc.steps) {
		if (!firstStepInto.has(step.to)) {
			firstStepInto.set(step.to, step);
		}
	}
	return routeOrder(doc)
		.map((node, index) => {
			let molfile: string;
			try {
				molfile = molfileOf(node);
			} catch (caught) {
				const reason = isStructureError(caught) ? caught.message : 'its structure cannot be read';
				throw new RouteFileError(
					`Intermediate “${node.label ?? node.id}” cannot be written as SDF: ${reason}`
				);
			}
			const step = firstStepInto.get(node.id);
			return (
				molfile +
				field('id', node.id) +
				field('label', node.label) +
				field('step', step?.id) +
				// "none" marks a starting material, which a plain SDF would join to the record before.
				field('from', step ? step.from.join(', ') : index === 0 ? undefined : NO_STEP) +
				field('reagents', step?.reagents) +
				field('conditions', step?.conditions?.join(', ')) +
				field('intent', step?.intent) +
				field('notes', step?.notes) +
				'$$$$\n'
			);
		})
		.join('');
}

const list = (value: string | undefined) =>
	(value ?? '')
		.split(/[,;]/)
		.map((item) => item.trim())
		.filter(Boolean);

/**
 * A route document from SDF text: records in order become intermediates, each joined to the one
 * before by a step (or to the records its `from` field names), with `reagents`, `conditions`,
 * `intent` and `notes` from the data fields. Throws RouteFileError naming the record.
 */
export function routeFromSdf(text: string, name: string): RouteDocument {
	let records;
	try {
		records = splitSdf(text);
	} catch (caught) {
		if (!isStructureError(caught)) {
			throw caught;
		}
		throw new RouteFileError(caught.message, caught.record, undefined, caught.code);
	}
	const intermediates: RouteIntermediate[] = [];
	const steps: RouteStep[] = [];
	const seen = new Map<string, number>();
	records.forEach((record, index) => {
		const n = index + 1;
		const fields = Object.fromEntries(
			Object.entries(record.fields).map(([key, value]) => [key.toLowerCase(), value])
		);
		const id = (fields.id ?? `i${n}`).trim().slice(0, 64) || `i${n}`;
		try {
			readStructure(record.molfile);
		} catch (caught) {
			if (!isStructureError(caught)) {
				throw caught;
			}
			throw new RouteFileError(
				`Record ${n} (“${id}”) cannot be read: ${caught.message}`,
				n,
				undefined,
				caught.code
			);
		}
		if (seen.has(id)) {
			throw new RouteFileError(
				`Record ${n} uses the id “${id}”, which record ${seen.get(id)} already has.`,
				n
			);
		}
		seen.set(id, n);
		const title = record.molfile.split('\n')[0]?.trim();
		const label = (fields.label ?? (title && title !== id ? title : undefined))?.slice(
			0,
			FIELD_LIMITS.intermediateLabel.max
		);
		intermediates.push({ id, ...(label ? { label } : {}), structure: record.molfile });
		if (index === 0 || fields.from?.trim().toLowerCase() === NO_STEP) {
			return;
		}
		const from = fields.from ? list(fields.from) : [intermediates[index - 1]!.id];
		const unknown = from.find((source) => !seen.has(source) || source === id);
		if (unknown) {
			throw new RouteFileError(
				`Record ${n} (“${id}”) starts from “${unknown}”, which no earlier record has as its id.`,
				n
			);
		}
		const intent = STEP_INTENTS.find((candidate) => candidate === fields.intent?.trim());
		const conditions = list(fields.conditions);
		steps.push({
			id: (fields.step ?? `s${index}`).trim().slice(0, 64) || `s${index}`,
			from,
			to: id,
			...(fields.reagents ? { reagents: fields.reagents } : {}),
			...(conditions.length ? { conditions } : {}),
			...(fields.notes ? { notes: fields.notes } : {}),
			...(intent ? { intent } : {})
		});
	});
	return checkedDocument({ name, intermediates, steps });
}

/** A route document from JSON text (a bare document, or a `GET /api/routes/{id}` answer), every structure readable. */
export function routeFromJson(text: string, fallbackName: string): RouteDocument {
	let parsed: unknown;
	try {
		parsed = JSON.parse(text);
	} catch {
		throw new RouteFileError('The file is not valid JSON.');
	}
	const body =
		parsed && typeof parsed === 'object' && 'document' in parsed
			? (parsed as { document: unknown }).document
			: parsed;
	const withName =
		body && typeof body === 'object' && !('name' in body) ? { ...body, name: fallbackName } : body;
	const doc = checkedDocument(withName);
	doc.intermediates.forEach((node, index) => {
		try {
			readStructure(node.structure);
		} catch (caught) {
			if (!isStructureError(caught)) {
				throw caught;
			}
			throw new RouteFileError(
				`Intermediate ${index + 1} (“${node.id}”) cannot be read: ${caught.message}`,
				index + 1,
				undefined,
				caught.code
			);
		}
	});
	return doc;
}

function checkedDocument(input: unknown): RouteDocument {
	const result = validateRouteDocument(input);
	if (result.ok) {
		return result.document;
	}
	const [first] = result.problems;
	const where = first!.path.length ? ` (at ${first!.path.join('.')})` : '';
	throw new RouteFileError(`${first!.message}${where}`, undefined, result.problems);
}

/** The largest file the import endpoint reads. */
export const MAX_IMPORT_BYTES = 5 * 1024 * 1024;
