/**
 * A team's override layer: ratings that replace the defaults for chosen cells. It sits over the
 * default table (see loadRuleTable) and never edits it, so a team can drop its layer at any time.
 */
import { z } from 'zod';
import { formatIssue, formatZodIssues, RuleTableError } from './issues';
import { FREE_GROUP_ALIASES, FREE_GROUP_IDS, type FreeGroupAlias, type FreeGroupId } from './ids';
import {
	conditionIdSchema,
	idEnum,
	protectingGroupIdSchema,
	stabilityRatingSchema
} from './schemas';

const text = z.string().trim().min(1, 'must not be empty');
/**
 * A reagent's name in rules/reagents.json: the row then holds only when that reagent brings the
 * class (TBS under TBAF, not under every fluoride). An unknown name never matches a step.
 */
const reagentName = text.optional();

const groupIdsAccepted = [
	...FREE_GROUP_IDS,
	...(Object.keys(FREE_GROUP_ALIASES) as FreeGroupAlias[])
] as const;
/** A free group id, or a retired id that stands for the groups it was split into (`aryl-halide`). */
const overrideGroupIdSchema = idEnum('free group id', groupIdsAccepted);
const isAlias = (id: string): id is FreeGroupAlias => Object.hasOwn(FREE_GROUP_ALIASES, id);

/**
 * `stability` replaces a protecting group's rating under one condition class; `reactivity`
 * replaces (or, with `none`, silences) a free group's entry. A row with a `reagent` holds for that
 * reagent of the class only, and beats a class-wide row. Each row says why, so the message
 * shown beside a clash carries the team's reason and source instead of the textbook's.
 */
export const ruleOverridesSchema = z.strictObject({
	name: text,
	stability: z
		.array(
			z.strictObject({
				protectingGroup: protectingGroupIdSchema,
				condition: conditionIdSchema,
				reagent: reagentName,
				rating: stabilityRatingSchema,
				reason: text,
				source: text.optional()
			})
		)
		.default([]),
	reactivity: z
		.array(
			z.strictObject({
				group: overrideGroupIdSchema,
				condition: conditionIdSchema,
				reagent: reagentName,
				rating: z.enum(['reacts', 'caution', 'none'], {
					error: (issue) =>
						`unknown reactivity rating ${JSON.stringify(issue.input)} (valid: reacts, caution, none)`
				}),
				reason: text,
				source: text.optional()
			})
		)
		.default([])
});

export type RuleOverridesInput = z.input<typeof ruleOverridesSchema>;
type ReactivityOverride = z.output<typeof ruleOverridesSchema>['reactivity'][number];
/** A validated layer: retired group ids are already spelled out as the groups they stand for. */
export type RuleOverrides = Omit<z.output<typeof ruleOverridesSchema>, 'reactivity'> & {
	reactivity: (ReactivityOverride & { group: FreeGroupId })[];
};

const layerName = (input: unknown) =>
	typeof (input as { name?: unknown } | null)?.name === 'string'
		? (input as { name: string }).name
		: 'the team';

/** The cell a row overrides, e.g. `TBS × fluoride` or `TBS × fluoride × TBAF`. */
const cellOf = (subject: string, row: { condition: string; reagent?: string }) =>
	`${subject} × ${row.condition}${row.reagent ? ` × ${row.reagent}` : ''}`;

/**
 * A row on a retired id (`aryl-halide`) becomes one row per group it was split into; a row the
 * team wrote on one of those groups for the same class is more specific and wins.
 */
function expandAliases(rows: ReactivityOverride[]): RuleOverrides['reactivity'] {
	const explicit = rows.filter((row) => !isAlias(row.group)) as RuleOverrides['reactivity'];
	const written = new Set(explicit.map((row) => cellOf(row.group, row)));
	const expanded = rows.flatMap((row) =>
		isAlias(row.group)
			? FREE_GROUP_ALIASES[row.group]
					.filter((group) => !written.has(cellOf(group, row)))
					.map((group) => ({ ...row, group }))
			: []
	);
	return [...explicit, ...expanded];
}

/**
 * A team's layer that does not fit the table (a row on an id the table no longer has): the
 * check refuses to answer for that team rather than quietly drop the row.
 */
export class OverrideLayerError extends RuleTableError {
	constructor(
		readonly team: string,
		problems: readonly string[]
	) {
		super(problems);
		this.name = 'OverrideLayerError';
	}
}

/** Validates a layer, e.g. `parseOverrides({ name: 'Team Kestrel', stability: [...] })`. */
export function parseOverrides(input: unknown): RuleOverrides {
	const label = 'overrides';
	const result = ruleOverridesSchema.safeParse(input);
	if (!result.success) {
		throw new OverrideLayerError(layerName(input), formatZodIssues(label, result.error));
	}
	const problems: string[] = [];
	const seen = new Set<string>();
	result.data.stability.forEach((row, index) => {
		const key = `stability ${cellOf(row.protectingGroup, row)}`;
		if (seen.has(key)) {
			problems.push(formatIssue(label, ['stability', index], `duplicate ${key}`));
		}
		seen.add(key);
	});
	result.data.reactivity.forEach((row, index) => {
		const key = `reactivity ${cellOf(row.group, row)}`;
		if (seen.has(key)) {
			problems.push(formatIssue(label, ['reactivity', index], `duplicate ${key}`));
		}
		seen.add(key);
	});
	if (problems.length > 0) {
		throw new OverrideLayerError(result.data.name, problems);
	}
	return { ...result.data, reactivity: expandAliases(result.data.reactivity) };
}
