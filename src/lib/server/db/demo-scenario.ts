import { z } from 'zod';
import { savedConditionFields } from '../../library/contract';
import { ROLES } from '../../policy';
import { ruleOverrideBody } from '../../team-rules/contract';
import { routeDocumentShape } from '../../route/document';
import scenario from './demo-scenario.json';

// A demo route may start in review: who asked whom, and the comments written since (each by
// e-mail; `replyToPrevious` answers the comment before it).
const demoReview = z.object({
	requestedBy: z.email(),
	reviewers: z.array(z.email()).min(1),
	note: z.string().optional(),
	comments: z
		.array(
			z.object({
				by: z.email(),
				stepId: z.string().optional(),
				replyToPrevious: z.boolean().default(false),
				body: z.string()
			})
		)
		.default([])
});
export type DemoReview = z.infer<typeof demoReview>;

// A team's saved conditions: the fields a person writes (the library's own schema), who wrote
// each, and the lead who approved it, if one has.
const demoSavedCondition = savedConditionFields.extend({
	by: z.email(),
	approvedBy: z.email().optional()
});
export type DemoSavedCondition = z.infer<typeof demoSavedCondition>;

// A team's rule overrides (issue 16), set by a lead of the team.
const demoRule = ruleOverrideBody.extend({ by: z.email() });
export type DemoRule = z.infer<typeof demoRule>;

// The JSON is the single source: the seed reads it here, `npm start` reads it to print sign-ins.
const demoSchema = z.object({
	password: z.string(),
	teams: z.array(
		z.object({
			name: z.string(),
			people: z.array(z.object({ email: z.email(), name: z.string(), role: z.enum(ROLES) })),
			library: z.array(demoSavedCondition).default([]),
			rules: z.array(demoRule).default([]),
			projects: z.array(
				z.object({
					name: z.string(),
					description: z.string(),
					routes: z.array(routeDocumentShape.extend({ review: demoReview.optional() })).default([])
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
