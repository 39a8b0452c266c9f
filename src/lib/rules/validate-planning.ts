/**
 * Cross-checks of the data the planner ranks and installs by: install recipes only take groups
 * their PG can draw, and preference lists only name PGs that protect the groups they are for.
 */
import { formatIssue, RULE_FILES } from './issues';
import type { Preference, ProtectingGroupConditions } from './schemas';

// `protects` belongs to the row's perception half (loose here; chem/patterns.ts validates it).
const protectsOf = (pg: ProtectingGroupConditions): readonly string[] => {
	const protects = (pg as { protects?: unknown }).protects;
	return Array.isArray(protects) ? (protects as string[]) : [];
};

/** Whether some install recipe of `pg` takes `group` (`takes`, else every group its transforms draw). */
function takenBy(pg: ProtectingGroupConditions, group: string): boolean {
	const drawn = pg.install.transforms.flatMap((t) => t.groups as readonly string[]);
	return pg.install.methods.some((m) => ((m.takes ?? drawn) as readonly string[]).includes(group));
}

/** A recipe's `takes` and `prefers` name only groups its PG's transforms draw. */
export function checkInstallMethods(pgs: ProtectingGroupConditions[], problems: string[]) {
	pgs.forEach((pg, index) => {
		const drawn = new Set(pg.install.transforms.flatMap((t) => t.groups as readonly string[]));
		pg.install.methods.forEach((method, m) => {
			const where = [index, 'install', 'methods', m];
			(method.takes ?? []).forEach((group, i) => {
				if (!drawn.has(group)) {
					problems.push(
						formatIssue(
							RULE_FILES.protectingGroups,
							[...where, 'takes', i],
							`"${group}" is not drawn by any of ${pg.id}'s install transforms`
						)
					);
				}
			});
			const takes = new Set<string>(method.takes ?? drawn);
			method.prefers.forEach((entry, i) => {
				if ((entry.over as readonly string[]).includes(entry.group)) {
					problems.push(
						formatIssue(
							RULE_FILES.protectingGroups,
							[...where, 'prefers', i],
							`"${entry.group}" cannot be preferred over itself`
						)
					);
				}
				for (const group of [entry.group, ...entry.over]) {
					if (!takes.has(group)) {
						problems.push(
							formatIssue(
								RULE_FILES.protectingGroups,
								[...where, 'prefers', i],
								`"${group}" is not a group this recipe takes`
							)
						);
					}
				}
			});
		});
	});
}

/**
 * Each group type has at most one preference row, and every PG listed protects each of its groups
 * and has an install recipe that takes it.
 */
export function checkPreferences(
	pgs: ProtectingGroupConditions[],
	rows: Preference[],
	problems: string[]
) {
	const byId = new Map(pgs.map((pg) => [pg.id, pg]));
	const seen = new Map<string, number>();
	rows.forEach((row, index) => {
		row.groups.forEach((group, i) => {
			const first = seen.get(group);
			if (first !== undefined) {
				problems.push(
					formatIssue(
						RULE_FILES.preferences,
						[index, 'groups', i],
						`"${group}" already has a preference row ([${first}])`
					)
				);
			} else {
				seen.set(group, index);
			}
		});
		const listed = new Set<string>();
		row.order.forEach((id, i) => {
			if (listed.has(id)) {
				problems.push(
					formatIssue(RULE_FILES.preferences, [index, 'order', i], `${id} listed twice`)
				);
			}
			listed.add(id);
			const pg = byId.get(id);
			const missing = pg ? row.groups.filter((g) => !protectsOf(pg).includes(g)) : [];
			if (missing.length) {
				problems.push(
					formatIssue(
						RULE_FILES.preferences,
						[index, 'order', i],
						`${id} does not protect ${missing.map((g) => `"${g}"`).join(', ')}`
					)
				);
			}
			// A PG no recipe can put on the group would never be offered for it: a stale row.
			const uninstallable = pg && !missing.length ? row.groups.filter((g) => !takenBy(pg, g)) : [];
			if (uninstallable.length) {
				problems.push(
					formatIssue(
						RULE_FILES.preferences,
						[index, 'order', i],
						`no install recipe of ${id} takes ${uninstallable.map((g) => `"${g}"`).join(', ')}`
					)
				);
			}
		});
	});
}
