/**
 * zod schemas for the rule-table files in rules/. Each enum reports the bad value and the valid
 * ones, so a load error reads as a fix, not a puzzle. Types come from these schemas (z.output).
 */
import { z } from 'zod';
import { REAGENT_CONCERNS, REAGENT_KINDS } from './ids';
import {
	conditionIdSchema,
	freeGroupIdSchema,
	idEnum,
	protectingGroupIdSchema,
	reactivityRatingSchema,
	reagentTagSchema,
	text
} from './schema-primitives';
import {
	installMethodSchema,
	methodSchema,
	pgDrawbackSchema,
	protectingGroupConditionsSchema,
	transformSchema,
	whereOnSchema
} from './protecting-group-schema';
import { physicalDataFields, unsourcedPhysicalData } from './physical';

// The shared enums and the protecting-group row live in schema-primitives.ts and
// protecting-group-schema.ts; callers keep importing every schema and type from here.
export {
	conditionIdSchema,
	freeGroupIdSchema,
	idEnum,
	protectingGroupIdSchema,
	reactivityRatingSchema,
	reagentTagSchema,
	stabilityRatingSchema
} from './schema-primitives';
export {
	installMethodSchema,
	installSchema,
	methodSchema,
	pgDrawbackSchema,
	protectingGroupConditionsFileSchema,
	protectingGroupConditionsSchema,
	transformSchema,
	whereOnSchema
} from './protecting-group-schema';

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
