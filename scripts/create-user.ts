// `npm run user:create -- --email you@lab.example --name "Your Name" --team "Your team"`
// Creates a team with its first lead (for a database started with ORTHOGON_DEMO=0).
import { createInterface } from 'node:readline/promises';
import { parseArgs } from 'node:util';
import { MIN_PASSWORD_LENGTH } from '../src/lib/schemas/password';
import { loadDotEnv, resolveEnvironment } from './environment.js';

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
	(await ask.question(`Password (${MIN_PASSWORD_LENGTH}+ characters): `));
ask.close();

if (password.length < MIN_PASSWORD_LENGTH) {
	console.error(`The password needs at least ${MIN_PASSWORD_LENGTH} characters.`);
	process.exit(1);
}
const { team, user } = await createTeamWithLead({ teamName, email, name, password });
console.log(
	`Created team “${team.name}” with ${user.email} as lead. Sign in at ${process.env.ORIGIN}.`
);
process.exit(0);
