/**
 * The fixed vocabularies of the rule table. Other modules (perception, the check, the planner,
 * the API) depend on these ids exactly, so they live in code where the type checker sees them;
 * the JSON files in rules/ must use them and the loader rejects anything else.
 */

import { FREE_GROUP_ALIASES as GROUP_ALIASES } from '../chem/group-aliases';

/**
 * Condition classes, in the order the rule table lists them. A class with `refines` in
 * rules/conditions.json is a finer class inside a broader one (e.g. `organometallic-grignard`
 * inside `organometallic`): it carries its own ratings only where they differ and otherwise
 * inherits the broader class's, so a finer class is never milder than the data says.
 */
export const CONDITION_IDS = [
	'acid-strong',
	'acid-mild',
	'acid-mild-aprotic',
	'lewis-acid',
	'lewis-acid-mild',
	'base-aqueous',
	'base-aqueous-mild',
	'base-amine',
	'base-strong',
	'base-strong-hydride',
	'nucleophile',
	'organometallic',
	'organometallic-grignard',
	'organometallic-soft',
	'hydride-strong',
	'hydride-strong-borane',
	'hydride-strong-borohydride',
	'hydride-mild',
	'hydride-mild-imine',
	'hydrogenation',
	'hydrogenation-poisoned',
	'hydrogenation-homogeneous',
	'dissolving-metal',
	'dissolving-metal-acid',
	'oxidant-mild',
	'oxidant-mild-allylic',
	'oxidant-mild-primary',
	'oxidant-mild-aldehyde',
	'oxidant-strong',
	'oxidant-strong-alkene',
	'oxidant-electron-transfer',
	'periodate',
	'fluoride',
	'fluoride-buffered',
	'palladium-zero',
	'soft-metal',
	'acylating',
	'acylating-amine',
	'alkylating',
	'fluorinating',
	'dehydrating',
	'metathesis',
	'heat'
] as const;
export type ConditionId = (typeof CONDITION_IDS)[number];

/** Protecting groups, by trade abbreviation (shared with src/lib/chem perception). */
export const PROTECTING_GROUP_IDS = [
	'TMS',
	'TES',
	'TBS',
	'TIPS',
	'TBDPS',
	'Bn',
	'PMB',
	'MOM',
	'THP',
	'Tr',
	'Ac',
	'Bz',
	'Piv',
	'acetonide',
	'benzylidene',
	'dioxolane',
	'dioxane',
	'dithiane',
	'dimethyl-acetal',
	'Boc',
	'Cbz',
	'Fmoc',
	'Alloc',
	'Ts',
	'phthalimide',
	'methyl-ester',
	'tBu-ester',
	'Bn-ester',
	'allyl-ester',
	'TMS-alkyne',
	'S-Tr',
	'methyl-ether',
	'allyl-ether',
	'SEM',
	'MEM',
	'BOM',
	'tBu-ether',
	'TIPDS',
	'DTBS',
	'PMP-acetal',
	'cyclic-carbonate',
	'ethyl-ester',
	'PMB-ester',
	'Ns',
	'Troc',
	'Teoc',
	'N-Bn',
	'acetamide',
	'trifluoroacetamide',
	'TIPS-alkyne',
	'TES-alkyne',
	'S-Ac',
	'MIDA-boronate',
	'Bdan'
] as const;
export type ProtectingGroupId = (typeof PROTECTING_GROUP_IDS)[number];

/** Free functional groups that reactivity.json rates (rules/groups.json uses the same ids). */
export const FREE_GROUP_IDS = [
	'aldehyde',
	'ketone',
	'ester',
	'carboxylic-acid',
	'amide',
	'carbamate',
	'diol-1,2',
	'diol-1,3',
	'alcohol-primary',
	'alcohol-secondary',
	'alcohol-tertiary',
	'phenol',
	'amine-primary',
	'amine-secondary',
	'thiol',
	'alkyne-terminal',
	'alkene',
	'epoxide',
	'nitrile',
	'acetal',
	'silyl-ether',
	'alkyl-halide',
	'aryl-halide-f-cl',
	'aryl-halide-br-i',
	'azide',
	'nitro',
	'imine',
	'sulfide',
	'indole-nh',
	'amine-tertiary',
	'alkyne-internal',
	'aniline',
	'azole-nh',
	'azine-nitrogen',
	'boronic-acid',
	'boronate-ester',
	'sulfonate-ester',
	'michael-acceptor',
	'vinyl-halide',
	'alcohol-allylic-benzylic'
] as const;
export type FreeGroupId = (typeof FREE_GROUP_IDS)[number];

/** Retired group ids clients may still send, each meaning the groups it was split into (`aryl-halide`). */
export const FREE_GROUP_ALIASES = GROUP_ALIASES satisfies Record<string, readonly FreeGroupId[]>;
export type FreeGroupAlias = keyof typeof FREE_GROUP_ALIASES;

/** How a protecting group stands up to a condition class. */
export const STABILITY_RATINGS = ['stable', 'caution', 'labile'] as const;
export type StabilityRating = (typeof STABILITY_RATINGS)[number];

/** How a free group fares under a condition class; a pair with no entry means no known problem. */
export const REACTIVITY_RATINGS = ['reacts', 'caution'] as const;
export type ReactivityRating = (typeof REACTIVITY_RATINGS)[number];

/**
 * What a reactivity.json row may say: a rating, or `none` — only for a finer class, where it
 * says that the broader class's entry does not apply (Ar–F under a Grignard reagent).
 */
export const REACTIVITY_ROW_RATINGS = [...REACTIVITY_RATINGS, 'none'] as const;
export type ReactivityRowRating = (typeof REACTIVITY_ROW_RATINGS)[number];

/** What a reagents.json entry is: only `reagent` entries must bring a condition class. */
export const REAGENT_KINDS = ['reagent', 'solvent', 'additive', 'workup'] as const;
export type ReagentKind = (typeof REAGENT_KINDS)[number];

/**
 * What a solvent or additive tells the classifier about the flask (rules/reagents.json `tags`);
 * a reagent row's `when` list picks its classes by them, e.g. K2CO3 with an `alcohol` present is
 * `base-aqueous` (methoxide forms), with only an `aprotic` solvent `base-aqueous-mild`.
 */
export const REAGENT_TAGS = [
	'water',
	'alcohol',
	'aprotic',
	'carboxylic-acid',
	'proton-source',
	'acyl-transfer-catalyst',
	'nitroxyl',
	'epoxidation-metal',
	'poisoned-catalyst',
	'homogeneous-catalyst',
	'copper'
] as const;
export type ReagentTag = (typeof REAGENT_TAGS)[number];

export function isConditionId(value: unknown): value is ConditionId {
	return typeof value === 'string' && (CONDITION_IDS as readonly string[]).includes(value);
}

/**
 * What a protecting group may sit on when that changes its ratings (a PG row's `whereOn`):
 * `aromatic-nitrogen` is the N of an indole, pyrrole or other azole (N-Boc and N-Ts there are
 * base-labile); `aryl-oxygen` is an O on an aromatic carbon (phenolic silyl ethers and aryl
 * acetates fall to milder bases than alkyl ones). The check derives it from the molecule.
 */
export const PG_SITES = ['aromatic-nitrogen', 'aryl-oxygen'] as const;
export type PgSite = (typeof PG_SITES)[number];

/**
 * A protecting group's own drawbacks, which the planner weighs above a bystander caution
 * (rules/protecting-groups.json `drawbacks`): `new-stereocentre` makes diastereomers on a chiral
 * substrate (THP) and counts only there; `fragile` is lost on silica, in work-up or in traces of
 * acid (TMS, dimethyl acetal); `migrates` moves between neighbouring OH groups (acetate on a diol).
 */
export const PG_DRAWBACKS = ['new-stereocentre', 'fragile', 'migrates'] as const;
export type PgDrawback = (typeof PG_DRAWBACKS)[number];

/**
 * Why a reagent is more than a routine hazard to the people who use it (rules/reagents.json
 * `concerns`); a PG recipe that needs such a reagent carries it as a drawback of the recipe,
 * e.g. MOMCl (`carcinogen`) or HgCl2 (`toxic-metal`).
 */
export const REAGENT_CONCERNS = [
	'carcinogen',
	'toxic-metal',
	'highly-toxic',
	'explosive',
	'pyrophoric'
] as const;
export type ReagentConcern = (typeof REAGENT_CONCERNS)[number];
