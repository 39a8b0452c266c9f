// The team's approved saved conditions in a plan (issue 16): where the planner adds a step that
// puts a PG on or takes it off and the team has an entry for that PG and kind, the step follows
// the entry instead of the textbook recipe — only if the plan still re-checks clean with it, and
// the rationale says which entry was followed, or why the textbook recipe stayed.

import type { SavedConditionKind } from '../../library/contract';
import type { RouteDocument } from '../../route/document';
import { siteOfGroup } from '../check/pg-site';
import type { CheckRules } from '../check/types';
import { drawRoute, type Drawn } from './route';
import type { RouteTree } from './tree';
import type { Need, Option, SavedConditionEntry, StepRecipe } from './types';

/** The entry followed for one PG and kind, and how many other approved entries it was chosen over. */
export type Preferred = { entry: SavedConditionEntry; others: number };

const keyOf = (pg: string, kind: SavedConditionKind) => `${pg}\u0001${kind}`;

/**
 * Per PG and kind, the entry to follow: the most used, then the highest yield (an unknown yield
 * last), then the lower id so the answer never depends on row order, e.g. two TBS installs used
 * 3 and 1 times → the one used 3 times.
 */
export function preferredEntries(entries: readonly SavedConditionEntry[]): Map<string, Preferred> {
	const byKey = new Map<string, SavedConditionEntry[]>();
	for (const entry of entries) {
		const key = keyOf(entry.protectingGroup, entry.kind);
		byKey.set(key, [...(byKey.get(key) ?? []), entry]);
	}
	const preferred = new Map<string, Preferred>();
	for (const [key, list] of byKey) {
		const [entry] = [...list].sort(
			(a, b) =>
				b.uses - a.uses ||
				(b.yield ?? -1) - (a.yield ?? -1) ||
				(a.id < b.id ? -1 : a.id > b.id ? 1 : 0)
		);
		preferred.set(key, { entry: entry!, others: list.length - 1 });
	}
	return preferred;
}

/** One PG and kind of a plan that a team's entry could replace. */
type Unit = Preferred & {
	pg: string;
	kind: SavedConditionKind;
	conditions: string[];
	textbook: string;
};

/** Why an entry was not followed, and what the plan keeps instead (the textbook recipe, a shared step). */
type Refusal = { reason: string; keeps: string };
const textbookOf = (unit: Unit) => `the textbook recipe (${unit.textbook})`;

export type Followed = { drawn: Drawn; options: Option[]; notes: string[] };

export type FollowInput = {
	doc: RouteDocument;
	tree: RouteTree;
	rules: CheckRules;
	needs: Need[];
	/** The plan's options, with the textbook recipes, as drawn into `textbook` and re-checked clean. */
	options: Option[];
	textbook: Drawn;
	preferred: Map<string, Preferred>;
	verify: (route: RouteDocument) => string | null;
};

/**
 * The plan with the team's entries written into its added steps where the re-check allows, e.g.
 * TBS on with the team's "TBSOTf, 2,6-lutidine" instead of TBSCl/imidazole; an entry that clashes
 * (a TBAF removal beside a TBDPS ether that must stay) leaves the textbook recipe and says why.
 */
export function followSavedConditions(input: FollowInput): Followed {
	const { doc, tree, rules, needs, options, textbook, preferred, verify } = input;
	const units = unitsOf(rules, options, preferred);
	if (units.length === 0) {
		return { drawn: textbook, options, notes: [] };
	}
	// Per unit: null when followed, else why not and what the plan keeps instead.
	const outcome = new Map<Unit, Refusal | null>();
	const usable = units.filter((unit) => {
		const reason = unreadable(rules, needs, options, unit);
		if (reason) {
			outcome.set(unit, { reason, keeps: textbookOf(unit) });
		}
		return !reason;
	});
	const attempt = (chosen: Unit[]) => {
		const followed = withUnits(options, chosen);
		const drawn = drawRoute(doc, tree, needs, followed);
		// An entry is for its own PG: where the plan frees several PGs in one step, following it
		// would add a step the ranking never counted.
		if (drawn.route.steps.length > textbook.route.steps.length) {
			const problem: Refusal = { reason: splits(textbook, chosen.at(-1)!), keeps: 'that one step' };
			return { drawn, options: followed, problem };
		}
		const clash = verify(drawn.route);
		const problem: Refusal | null = clash
			? {
					reason: `with it the re-check finds ${clash.replace(/\.$/, '')}`,
					keeps: textbookOf(chosen.at(-1)!)
				}
			: null;
		return { drawn, options: followed, problem };
	};
	let best = { drawn: textbook, options };
	const all = usable.length ? attempt(usable) : null;
	if (all && !all.problem) {
		best = all;
		usable.forEach((unit) => outcome.set(unit, null));
	} else if (all && usable.length === 1) {
		outcome.set(usable[0]!, all.problem);
	} else {
		// One by one, in plan order: each entry that keeps the plan clean is kept for the next.
		const accepted: Unit[] = [];
		for (const unit of usable) {
			const tried = attempt([...accepted, unit]);
			outcome.set(unit, tried.problem);
			if (!tried.problem) {
				accepted.push(unit);
				best = tried;
			}
		}
	}
	const notes = units.map((unit) => {
		const refusal = outcome.get(unit);
		return refusal ? notFollowed(unit, refusal) : followed(unit);
	});
	return { drawn: best.drawn, options: best.options, notes };
}

/** Why following the entry would add a step, e.g. "the plan takes TBS off in one step with dioxolane, …". */
function splits(textbook: Drawn, unit: Unit): string {
	const others = textbook.merged
		.find((pgs) => pgs.includes(unit.pg))
		?.filter((pg) => pg !== unit.pg);
	const partners = others?.length ? [...new Set(others)].join(', ') : 'another group';
	return `the plan takes ${unit.pg} off in one step with ${partners}, and the saved condition is for ${unit.pg} alone`;
}

/** The PGs and kinds of the plan that have an entry, in need order, install before removal. */
function unitsOf(rules: CheckRules, options: Option[], preferred: Map<string, Preferred>): Unit[] {
	const units = new Map<string, Unit>();
	for (const option of options) {
		for (const kind of ['install', 'remove'] as const) {
			const key = keyOf(option.pg, kind);
			const found = preferred.get(key);
			if (!found || units.has(key)) {
				continue;
			}
			units.set(key, {
				...found,
				pg: option.pg,
				kind,
				conditions: rules.classify(found.entry.reagents).conditions,
				textbook: (kind === 'install' ? option.install : option.removal).reagents
			});
		}
	}
	return [...units.values()];
}

/** Why an entry cannot even be tried, or null: its classes must be known, and a removal must remove. */
function unreadable(
	rules: CheckRules,
	needs: Need[],
	options: Option[],
	unit: Unit
): string | null {
	if (unit.conditions.length === 0) {
		return 'Orthogon reads no condition class in its reagents, so the re-check could not judge it';
	}
	if (unit.kind === 'install') {
		return null;
	}
	const matched = rules.classify(unit.entry.reagents).matched;
	const removes = options.every(
		(option, i) =>
			option.pg !== unit.pg ||
			unit.conditions.some(
				(c) =>
					rules.stability(
						unit.pg,
						c,
						matched.filter((m) => m.conditions.includes(c)).map((m) => m.reagent),
						siteOfGroup(needs[i]!.group)
					).rating === 'labile'
			)
	);
	const labels = unit.conditions.map((c) => rules.conditionLabel(c).toLowerCase()).join(', ');
	return removes
		? null
		: `the rule table does not rate ${unit.pg} labile under its conditions (${labels})`;
}

/** The options with each unit's entry as the recipe of its PG and kind. */
function withUnits(options: Option[], units: Unit[]): Option[] {
	const recipe = (unit: Unit): StepRecipe => ({
		reagents: unit.entry.reagents,
		conditions: [...unit.conditions],
		savedCondition: unit.entry.id
	});
	return options.map((option) => {
		const install = units.find((u) => u.pg === option.pg && u.kind === 'install');
		const removal = units.find((u) => u.pg === option.pg && u.kind === 'remove');
		if (!install && !removal) {
			return option;
		}
		return {
			...option,
			install: install ? recipe(install) : option.install,
			removal: removal ? recipe(removal) : option.removal
		};
	});
}

const side = (unit: Unit) => `${unit.pg} ${unit.kind === 'install' ? 'on' : 'off'}`;

/** E.g. "TBS on: the team's saved condition (TBSOTf, 2,6-lutidine, CH2Cl2, −78 °C), 94 % on 2 g, ref. NB-OG-112, …". */
function followed(unit: Unit): string {
	const { entry } = unit;
	const record = [
		entry.yield !== null ? `${entry.yield} %${entry.scale ? ` on ${entry.scale}` : ''}` : null,
		entry.yield === null && entry.scale ? `run on ${entry.scale}` : null,
		entry.reference ? `ref. ${entry.reference}` : null,
		entry.uses
			? `followed by ${entry.uses} step${entry.uses === 1 ? '' : 's'} of the team's routes`
			: "not yet followed by a step of the team's routes"
	].filter((part) => part !== null);
	const chosen = unit.others
		? ` It is chosen over ${unit.others} other approved entr${unit.others === 1 ? 'y' : 'ies'} for ${side(unit)} by uses, then yield.`
		: '';
	const textbook =
		entry.reagents.trim().toLowerCase() === unit.textbook.trim().toLowerCase()
			? 'the same as the textbook recipe'
			: `instead of the textbook recipe (${unit.textbook})`;
	return `${side(unit)}: the team's saved condition (${entry.reagents}), ${record.join(', ')}, ${textbook}.${chosen}`;
}

/** E.g. "TBS off: the team's saved condition (TBAF, THF) was not used: with it the re-check finds …". */
function notFollowed(unit: Unit, { reason, keeps }: Refusal): string {
	return `${side(unit)}: the team's saved condition (${unit.entry.reagents}) was not used: ${reason}; the plan keeps ${keeps}.`;
}
