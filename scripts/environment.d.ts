export function dataDir(env?: NodeJS.ProcessEnv): string;
export function databaseFile(dir: string): string;
export function demoScenario(): {
	password: string;
	teams: { name: string; people: { email: string; name: string; role: string }[] }[];
};
export function demoSignIn(role: string): { email: string; password: string };
export function loadDotEnv(): void;
export function resolveEnvironment(env?: NodeJS.ProcessEnv): NodeJS.ProcessEnv & {
	PORT: string;
	ORIGIN: string;
	DATABASE_URL: string;
	BODY_SIZE_LIMIT: string;
	AUTH_SECRET: string;
};
