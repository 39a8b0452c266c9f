/**
 * zod schemas for the rule-table files in rules/. Each enum reports the bad value and the valid
 * ones, so a load error reads as a fix, not a puzzle. Types come from these schemas (z.output).
 */
import { z } from 'zod';
import {
	CONDITION_IDS,
	FREE_GROUP_IDS,
	PG_DRAWBACKS,
	PG_SITES,
	PROTECTING_GROUP_IDS,
	REAGENT_CONCERNS,
	REACTIVITY_ROW_RATINGS,
	REAGENT_KINDS,
	REAGENT_TAGS,
	STABILITY_RATINGS
} from './ids';
import { physicalDataFields, unsourcedPhysicalData } from './physical';

/** An enum whose error names the bad value and lists the valid ones. */
export function idEnum<const T extends readonly [string, ...string[]]>(what: string, values: T) {
	return z.enum(values, {
		error: (issue) =>
			issue.input === undefined
				? `missing ${what}`
				: `unknown ${what} ${JSON.stringify(issue.input)} (valid: ${values.join(', ')})`
	});
}

const text = z.string().trim().min(1, 'must not be empty');

export const conditionIdSchema = idEnum('condition id', CONDITION_IDS);
export const protectingGroupIdSchema = idEnum('protecting group id', PROTECTING_GROUP_IDS);
export const freeGroupIdSchema = idEnum('free group id', FREE_GROUP_IDS);
export const stabilityRatingSchema = z.enum(STABILITY_RATINGS, {
	error: (issue) =>
		issue.input === undefined
			? 'missing rating (every condition class needs one: stable, caution or labile)'
			: `unknown rating ${JSON.stringify(issue.input)} (valid: ${STABILITY_RATINGS.join(', ')})`
});
export const reactivityRatingSchema = idEnum('reactivity rating', REACTIVITY_ROW_RATINGS);

/**
 * One row of rules/conditions.json, e.g. `{ id: 'fluoride', label: 'Fluoride', … }`. `refines`
 * names the broader class a finer one sits in (one level: the broader class refines nothing).
 */
export const conditionSchema = z.strictObject({
	id: conditionIdSchema,
	refines: conditionIdSchema.optional(),
	label: text,
	description: text,
	examples: z.array(text).min(1)
});
export const conditionsFileSchema = z.array(conditionSchema);

export const reagentTagSchema = idEnum('reagent tag', REAGENT_TAGS);

/**
 * One entry of a reagent row's `when` list: if another reagent in the same step carries `tag`,
 * the row brings `conditions` instead of its own, and `why` says so in the clash message, e.g.
 * `{ tag: 'alcohol', conditions: ['base-aqueous'], why: 'carbonate in an alcohol: alkoxide forms' }`.
 */
export const reagentContextSchema = z.strictObject({
	tag: reagentTagSchema,
	conditions: z.array(conditionIdSchema).min(1),
	why: text
});

/**
 * One row of rules/reagents.json. `conditions` are the classes the reagent brings in its typical
 * use (DHP implies the acid catalyst it is always used with), or with none of the `when` tags
 * present; the first `when` entry whose tag another reagent of the step carries wins. `tags` say
 * what this row tells the others (MeOH: `alcohol`). Solvents, additives and work-up materials may
 * bring no class; they are listed so that the classifier recognises them and shows their hazards.
 * `exactCase` lists synonyms that match only as written ("CAN" but not "can").
 */
export const reagentSchema = z
	.strictObject({
		name: text,
		synonyms: z.array(text),
		conditions: z.array(conditionIdSchema),
		kind: z.enum(REAGENT_KINDS).default('reagent'),
		tags: z.array(reagentTagSchema).optional(),
		when: z.array(reagentContextSchema).min(1).optional(),
		exactCase: z.array(text).optional(),
		hazard: text.optional(),
		/**
		 * What makes the reagent more than a routine hazard (carcinogen, toxic metal, …): a PG
		 * recipe that uses it carries it as a drawback when the planner ranks plans.
		 */
		concerns: z.array(idEnum('reagent concern', REAGENT_CONCERNS)).min(1).optional(),
		/** Where the row comes from: a book and chapter, a paper, "common practice" or "from memory". */
		source: text.optional(),
		// molarMass, density, boilingPoint, physicalSource (issue 14: quantities)
		...physicalDataFields
	})
	.superRefine((reagent, ctx) => {
		if (unsourcedPhysicalData(reagent)) {
			ctx.addIssue({
				code: 'custom',
				path: ['physicalSource'],
				message: 'physical data needs a source'
			});
		}
		if (reagent.kind === 'reagent' && reagent.conditions.length === 0) {
			ctx.addIssue({
				code: 'custom',
				path: ['conditions'],
				message:
					'a reagent must bring at least one condition class (or set kind to solvent, additive or workup)'
			});
		}
		for (const [i, entry] of (reagent.when ?? []).entries()) {
			if (reagent.tags?.includes(entry.tag)) {
				ctx.addIssue({
					code: 'custom',
					path: ['when', i, 'tag'],
					message: `"${entry.tag}" is one of this reagent's own tags; a context comes from another reagent of the step`
				});
			}
		}
		for (const [i, spelling] of (reagent.exactCase ?? []).entries()) {
			if (spelling !== reagent.name && !reagent.synonyms.includes(spelling)) {
				ctx.addIssue({
					code: 'custom',
					path: ['exactCase', i],
					message: `"${spelling}" is neither the name nor a synonym of this reagent`
				});
			}
		}
	});
export const reagentsFileSchema = z.array(reagentSchema);

/**
 * One row of rules/reactivity.json: a free group under a condition class. A finer class with no
 * row of its own inherits the broader class's row; `none` (finer classes only) says it does not.
 */
export const reactivitySchema = z
	.strictObject({
		group: freeGroupIdSchema,
		condition: conditionIdSchema,
		rating: reactivityRatingSchema,
		reason: text,
		source: text,
		/**
		 * Exceptions for named reagents (names as in rules/reagents.json) that bring this class, e.g.
		 * a tertiary alcohol `caution` under strong acid but `none` under TFA in CH2Cl2. Where a step
		 * has several reagents of the class, the worst rating among them applies.
		 */
		reagentRatings: z
			.array(z.strictObject({ reagent: text, rating: reactivityRatingSchema, reason: text }))
			.default([]),
		/**
		 * On a `caution` row: chemists usually mask the group rather than accept the caution (a free
		 * amine beside a Swern oxidation or a Grignard reagent), so the planner's first plans mask it;
		 * without it the first plan leaves the group free and later plans offer the mask.
		 */
		usuallyMasked: z.literal(true).optional()
	})
	.refine((row) => !row.usuallyMasked || row.rating === 'caution', {
		path: ['usuallyMasked'],
		message: 'only a caution row can say the group is usually masked (a reacts row always is)'
	});
export const reactivityFileSchema = z.array(reactivitySchema);

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

/**
 * One row of rules/preferences.json: for these group types, the PGs a chemist reaches for first
 * when plans are otherwise equal (robustness and commonness), best first, e.g. TBS before TES
 * for an alcohol. PGs not listed come after the listed ones.
 */
export const preferenceSchema = z.strictObject({
	groups: z.array(freeGroupIdSchema).min(1),
	order: z.array(protectingGroupIdSchema).min(1),
	reason: text,
	source: text
});
export const preferencesFileSchema = z.array(preferenceSchema);

export type Condition = z.output<typeof conditionSchema>;
export type Reagent = z.output<typeof reagentSchema>;
export type ReagentContext = z.output<typeof reagentContextSchema>;
export type ReactivityEntry = z.output<typeof reactivitySchema>;
export type Method = z.output<typeof methodSchema>;
export type InstallMethod = z.output<typeof installMethodSchema>;
export type PgDrawbackEntry = z.output<typeof pgDrawbackSchema>;
export type Preference = z.output<typeof preferenceSchema>;
export type Transform = z.output<typeof transformSchema>;
export type ProtectingGroupConditions = z.output<typeof protectingGroupConditionsSchema>;
export type WhereOnEntry = z.output<typeof whereOnSchema>[number];
