import { json } from '@sveltejs/kit';
import type { RequestHandler } from './$types';
import type { RulesAnswer } from '$lib/api/answers';
import { apiHandler } from '$lib/server/api';
import { requireUser } from '$lib/server/auth/guards';
import { perceptionRules } from '$lib/chem/patterns';
import { loadRuleTable } from '$lib/rules';

/** `GET /api/rules` → `{ conditions, protectingGroups, groups }`: the rule table as loaded. */
export const GET: RequestHandler = apiHandler(async (event) => {
	requireUser(event);
	const table = loadRuleTable();
	// Compiled search patterns are openchemlib objects; the rows are what the files say.
	const groups = perceptionRules().groups.map(({ compiled: _compiled, ...row }) => row);
	// A finer class a row does not rate inherits its broader class's rating; the answer spells
	// every class out so that clients need not know the inheritance.
	const protectingGroups = table.protectingGroups.map((row) => ({
		...row,
		stability: table.ratingsOf(row.id)
	}));
	return json({ conditions: table.conditions, protectingGroups, groups } satisfies RulesAnswer);
});
