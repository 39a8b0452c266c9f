// A team's stored rule overrides as the rule table's override layer (src/lib/rules/overrides.ts):
// plain JSON, so it crosses into the chemistry worker, which builds the layered table there.
// Read per request from the database, never kept in the process: every app instance on one
// database applies the same overrides the moment a lead changes them.

import type { RequestEvent } from '@sveltejs/kit';
import { z } from 'zod';
import { PROTECTING_GROUP_IDS } from '../../rules/ids';
import { requireTeamAction } from '../auth/guards';
import type { RuleOverridesInput } from '../../rules/overrides';
import { dbReady, Project, Team, TeamRuleOverride, type Route } from '../db';

type StabilityRow = NonNullable<RuleOverridesInput['stability']>[number];
type ReactivityRow = NonNullable<RuleOverridesInput['reactivity']>[number];

const isProtectingGroup = (subject: string) =>
	(PROTECTING_GROUP_IDS as readonly string[]).includes(subject);

/**
 * The team's layer, or undefined when it has no overrides (its checks then match everyone's),
 * e.g. `{ name: 'Kestrel', stability: [{ protectingGroup: 'TBS', condition: 'fluoride', … }] }`.
 * A subject that is not a PG id goes in as a free group, so a row the table no longer knows is
 * refused by name when the layer is read (never dropped unseen). Two rows on one cell (two leads
 * at once): the later one holds.
 */
export async function teamRuleLayer(teamId: string): Promise<RuleOverridesInput | undefined> {
	await dbReady();
	const rows = await TeamRuleOverride.findAll({
		where: { teamId },
		order: [
			['createdAt', 'ASC'],
			['id', 'ASC']
		]
	});
	// Most teams have no overrides: their checks (one per save on the route map) ask nothing more.
	const team = rows.length > 0 ? await Team.findByPk(teamId, { attributes: ['name'] }) : null;
	if (!team) {
		return undefined;
	}
	const stability = new Map<string, StabilityRow>();
	const reactivity = new Map<string, ReactivityRow>();
	for (const row of rows) {
		const cell = `${row.subject}\u0000${row.condition}\u0000${row.reagent ?? ''}`;
		const said = {
			condition: row.condition,
			...(row.reagent ? { reagent: row.reagent } : {}),
			reason: row.reason,
			source: row.source
		};
		if (isProtectingGroup(row.subject)) {
			stability.set(cell, {
				...said,
				protectingGroup: row.subject,
				rating: row.rating
			} as StabilityRow);
		} else {
			reactivity.set(cell, { ...said, group: row.subject, rating: row.rating } as ReactivityRow);
		}
	}
	return {
		name: team.name,
		stability: [...stability.values()],
		reactivity: [...reactivity.values()]
	};
}

/** The layer of the team that owns a route (its project's team), e.g. for `GET /api/routes/{id}/check`. */
export async function routeRuleLayer(route: Route): Promise<RuleOverridesInput | undefined> {
	const project = route.project ?? (await Project.findByPk(route.projectId));
	return project ? teamRuleLayer(project.teamId) : undefined;
}

/** The optional `teamId` of `POST /api/check` and `POST /api/plan`: whose overrides to apply. */
export const teamIdField = z.uuid('teamId names a team by its id (a UUID).').optional();

/**
 * The layer of `teamId` for a caller in that team (another team, or none: 404 before anything is
 * checked), or undefined when no team is named (the defaults apply).
 */
export async function callerTeamLayer(
	event: Pick<RequestEvent, 'locals' | 'url'>,
	teamId: string | undefined
): Promise<RuleOverridesInput | undefined> {
	if (teamId === undefined) {
		return undefined;
	}
	await requireTeamAction(event, teamId, 'project.read');
	return teamRuleLayer(teamId);
}
