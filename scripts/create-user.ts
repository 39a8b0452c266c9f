// `npm run user:create -- --email you@lab.example --name "Your Name" --team "Your team"`
// Creates a team with its first lead (for a database started with ORTHOGON_DEMO=0).
import { createInterface } from 'node:readline/promises';
import { parseArgs } from 'node:util';
import { loadDotEnv, resolveEnvironment } from './environment.js';
import { FIELD_LIMITS } from '../src/lib/schemas/limits';
import { chosenPassword } from '../src/lib/schemas/password';

const { values } = parseArgs({
	options: {
		email: { type: 'string' },
		name: { type: 'string' },
		team: { type: 'string' },
		password: { type: 'string' }
	}
});

loadDotEnv();
Object.assign(process.env, resolveEnvironment());
const { createTeamWithLead } = await import('../src/lib/server/services/teams');

const ask = createInterface({ input: process.stdin, output: process.stdout });
const email = values.email ?? (await ask.question('E-mail of the first lead: '));
const name = values.name ?? (await ask.question('Their name: '));
const teamName = values.team ?? (await ask.question('Team name: '));
const password =
	values.password ??
	process.env.ORTHOGON_PASSWORD ??
	(await ask.question(`Password (${FIELD_LIMITS.password.min}+ characters): `));
ask.close();

// The same limits as the sign-up and account forms (src/lib/schemas/limits.ts).
const problems = [
	...(chosenPassword.safeParse(password).error?.issues ?? []).map((i) => `Password: ${i.message}`),
	...(name.length > FIELD_LIMITS.personName.max
		? [`Name: keep it to ${FIELD_LIMITS.personName.max} characters.`]
		: []),
	...(teamName.length > FIELD_LIMITS.teamName.max
		? [`Team name: keep it to ${FIELD_LIMITS.teamName.max} characters.`]
		: [])
];
if (problems.length > 0) {
	console.error(problems.join('\n'));
	process.exit(1);
}
const { team, user } = await createTeamWithLead({ teamName, email, name, password });
console.log(
	`Created team “${team.name}” with ${user.email} as lead. Sign in at ${process.env.ORIGIN}.`
);
process.exit(0);
