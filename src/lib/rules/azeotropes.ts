/**
 * rules/azeotropes.json: solvent–water azeotropes a water-separating trap can use (issue 14).
 * Validated with zod at first use, like the other rule files; a bad row is a RuleTableError
 * naming the file, row and field.
 */
import { z } from 'zod';
import azeotropesFile from '../../../rules/azeotropes.json';
import { WATER_LAYERS } from '../quantities/contract';
import { formatZodIssues, RuleTableError } from './issues';

const text = z.string().trim().min(1, 'must not be empty');

/** One row, e.g. toluene: solvent bp 110.6 °C, azeotrope 84.1 °C, 20.2 % water, water the lower layer. */
export const azeotropeSchema = z
	.strictObject({
		/** What `waterRemoval.solvent` names, e.g. `toluene`. */
		id: text.regex(/^[a-z0-9,-]+$/, 'must be lower case letters, digits, commas and dashes'),
		name: text,
		/** °C at atmospheric pressure. */
		solventBoilingPoint: z.number().finite(),
		/** °C: the head temperature while the azeotrope distils. */
		boilingPoint: z.number().finite(),
		waterMassPercent: z.number().gt(0).lt(100),
		/** g/mL at 20–25 °C. */
		solventDensity: z.number().positive(),
		/** Where the water collects in the trap: `upper` for a solvent denser than water. */
		waterLayer: z.enum(WATER_LAYERS),
		flammable: z.boolean(),
		carcinogen: z.enum(['known', 'suspected']).optional(),
		hazards: z.array(text),
		source: text
	})
	.refine((row) => row.boilingPoint < row.solventBoilingPoint, {
		path: ['boilingPoint'],
		message: 'a heterogeneous azeotrope with water boils below the solvent'
	})
	.refine((row) => (row.waterLayer === 'upper') === row.solventDensity > 1, {
		path: ['waterLayer'],
		message: 'water is the upper layer exactly when the solvent is denser than water'
	});
export const azeotropesFileSchema = z.array(azeotropeSchema).superRefine((rows, ctx) => {
	const seen = new Set<string>();
	rows.forEach((row, i) => {
		if (seen.has(row.id)) {
			ctx.addIssue({ code: 'custom', path: [i, 'id'], message: `a second row for ${row.id}` });
		}
		seen.add(row.id);
	});
});
export type Azeotrope = z.output<typeof azeotropeSchema>;

/** Validates raw rows, e.g. `parseAzeotropes(JSON.parse(text))`; throws RuleTableError. */
export function parseAzeotropes(raw: unknown): readonly Azeotrope[] {
	const parsed = azeotropesFileSchema.safeParse(raw);
	if (!parsed.success) {
		throw new RuleTableError(formatZodIssues('rules/azeotropes.json', parsed.error));
	}
	return Object.freeze(parsed.data.map((row) => Object.freeze(row)));
}

let loaded: readonly Azeotrope[] | null = null;

/** The bundled azeotropes, validated once, e.g. `loadAzeotropes().find((a) => a.id === 'toluene')`. */
export function loadAzeotropes(): readonly Azeotrope[] {
	loaded ??= parseAzeotropes(azeotropesFile);
	return loaded;
}
