/**
 * The schema of the condition half of a protecting-group row (rules/protecting-groups.json): how
 * it goes on and comes off, how stable it is under each class, where a rating depends on what it
 * sits on, and its own drawbacks. The largest row of the rule files, so it has a file of its own;
 * schemas.ts re-exports it with the other row schemas.
 */
import { z } from 'zod';
import { CONDITION_IDS, PG_DRAWBACKS, PG_SITES } from './ids';
import {
	conditionIdSchema,
	freeGroupIdSchema,
	idEnum,
	protectingGroupIdSchema,
	stabilityRatingSchema,
	text
} from './schema-primitives';

/** A way to install or remove a protecting group: typical reagents and the classes they bring. */
export const methodSchema = z.strictObject({
	reagents: z.array(text).min(1),
	conditions: z.array(conditionIdSchema).min(1),
	note: text.optional()
});

/**
 * How the planner draws the PG onto a free group: a reaction SMARTS run with openchemlib's Reactor
 * on the chosen atoms, e.g. `[O;H1:1]>>[O:1][Si](C)(C)C(C)(C)C` for TBS on any alcohol. Mapped
 * atoms stay, unmapped reactant atoms leave (a carbonyl's O), unmapped product atoms are the PG.
 */
export const transformSchema = z.strictObject({
	groups: z.array(freeGroupIdSchema).min(1),
	smarts: text.regex(/^[^>]+>>[^>]+$/, 'must be one reaction SMARTS, "reactant>>product"')
});

/**
 * Ratings that hold only when the PG sits on a given kind of atom, e.g. `{ site: 'aromatic-nitrogen',
 * condition: 'base-aqueous', rating: 'labile', reason: 'NaOMe in MeOH removes Boc from an indole N' }`.
 * An entry stands at its class's level: it wins over the row's own rating for that class (and is
 * inherited by a finer class the row does not rate), while a team override still wins over it.
 */
export const whereOnSchema = z
	.array(
		z.strictObject({
			site: idEnum('site', PG_SITES),
			condition: conditionIdSchema,
			rating: stabilityRatingSchema,
			reason: text
		})
	)
	.default([])
	.superRefine((entries, ctx) => {
		const seen = new Set<string>();
		entries.forEach((entry, i) => {
			const key = `${entry.site} ${entry.condition}`;
			if (seen.has(key)) {
				ctx.addIssue({ code: 'custom', path: [i], message: `a second entry for ${key}` });
			}
			seen.add(key);
		});
	});

/**
 * Which free groups an install recipe's reagent converts when they are present, e.g. TBDPSCl,
 * imidazole takes primary and secondary alcohols and phenols (`takes`) and a primary alcohol
 * before a secondary one (`prefers`). `takes` defaults to every group the PG's transforms draw;
 * groups it takes and does not tell apart all get the PG (DHP takes every free OH). A recipe is
 * offered only for a group it takes.
 */
export const installMethodSchema = methodSchema.extend({
	takes: z.array(freeGroupIdSchema).min(1).optional(),
	prefers: z
		.array(
			z.strictObject({
				group: freeGroupIdSchema,
				over: z.array(freeGroupIdSchema).min(1),
				reason: text
			})
		)
		.default([])
});

/**
 * How a PG goes on: the transforms that draw its result (one per protected group type) and the
 * install recipes, usual one first; the planner tries each and uses the one that fits the molecule.
 */
export const installSchema = z.strictObject({
	transforms: z.array(transformSchema).min(1),
	methods: z.array(installMethodSchema).min(1)
});

/**
 * A PG's own drawback, weighed above a bystander caution when plans are ranked, e.g.
 * `{ kind: 'fragile', note: 'Dimethyl acetals hydrolyse in traces of aqueous acid …' }`.
 */
export const pgDrawbackSchema = z.strictObject({
	kind: idEnum('drawback', PG_DRAWBACKS),
	note: text
});

/**
 * The condition half of a protecting-group row (rules/protecting-groups.json): `install` is the
 * usual method; `remove` lists alternative methods; `stability` rates EVERY condition class (a
 * missing cell is a load error); `source` credits the ratings. The perception half of the same
 * row (label, protects, patterns, …) is validated by src/lib/chem/patterns.ts, hence `loose`.
 */
export const protectingGroupConditionsSchema = z
	.object({
		id: protectingGroupIdSchema,
		install: installSchema,
		remove: z.array(methodSchema).min(1),
		// Every broader class must be rated (validate.ts checks, as it knows which classes are finer);
		// a finer class is rated only where it differs from its broader class.
		stability: z.partialRecord(conditionIdSchema, stabilityRatingSchema, {
			// zod reports extra keys of an enum-keyed record as `unrecognized_keys` (not in its types).
			error: (issue) => {
				const keys = (issue as { keys?: unknown }).keys;
				return Array.isArray(keys)
					? `unknown condition id ${keys.map((key) => JSON.stringify(key)).join(', ')} (valid: ${CONDITION_IDS.join(', ')})`
					: 'must be an object of condition id → rating';
			}
		}),
		/**
		 * Exceptions to a class rating for named reagents (names as in rules/reagents.json), e.g.
		 * Fmoc is `caution` under base-amine (tertiary amines) but `labile` to piperidine.
		 */
		reagentRatings: z
			.array(
				z.strictObject({
					reagent: text,
					condition: conditionIdSchema,
					rating: stabilityRatingSchema,
					reason: text
				})
			)
			.default([]),
		whereOn: whereOnSchema,
		notes: z.array(text),
		/** Its own drawbacks (a new stereocentre, fragility); `new-stereocentre` counts only on a chiral substrate. */
		drawbacks: z.array(pgDrawbackSchema).default([]),
		source: text
	})
	.loose();
export const protectingGroupConditionsFileSchema = z.array(protectingGroupConditionsSchema);
