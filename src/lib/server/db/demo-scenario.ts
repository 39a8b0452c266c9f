import { z } from 'zod';
import { ROLES } from '../../policy';
import { routeDocumentShape } from '../../route/document';
import scenario from './demo-scenario.json';

// The JSON is the single source: the seed reads it here, `npm start` reads it to print sign-ins.
const demoSchema = z.object({
	password: z.string(),
	teams: z.array(
		z.object({
			name: z.string(),
			people: z.array(z.object({ email: z.email(), name: z.string(), role: z.enum(ROLES) })),
			projects: z.array(
				z.object({
					name: z.string(),
					description: z.string(),
					routes: z.array(routeDocumentShape).default([])
				})
			)
		})
	)
});

const demo = demoSchema.parse(scenario);

export const DEMO_PASSWORD = demo.password;
export const DEMO_TEAMS = demo.teams;
export const DEMO_SIGN_INS = DEMO_TEAMS.flatMap((team) =>
	team.people.map((p) => ({ ...p, team: team.name }))
);
