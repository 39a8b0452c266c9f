import { readdirSync, readFileSync, statSync } from 'node:fs';
import { join, relative, sep } from 'node:path';

/** One HTTP method of a `+server.ts` or one form action of a `+page.server.ts`. */
export type Endpoint = {
	key: string;
	file: string;
	route: string;
	kind: 'method' | 'action';
	name: string;
};

const HTTP_EXPORTS = /export const (GET|POST|PUT|PATCH|DELETE|fallback)\b/g;

function routeFiles(dir: string, out: string[] = []): string[] {
	for (const name of readdirSync(dir)) {
		const path = join(dir, name);
		if (statSync(path).isDirectory()) {
			routeFiles(path, out);
		} else if (name === '+server.ts' || name === '+page.server.ts') {
			out.push(path);
		}
	}
	return out;
}

/** The module of a route file, imported the way Vite resolves it in tests. */
export async function routeModule(file: string): Promise<Record<string, unknown>> {
	return import(/* @vite-ignore */ '../../' + file.split(sep).join('/'));
}

/**
 * Every endpoint in src/routes, keyed like `PUT /api/routes/[routeId=uuid]` or
 * `action create /projects`: methods read from the source, actions from the module's `actions`.
 */
export async function discoverEndpoints(): Promise<Endpoint[]> {
	const endpoints: Endpoint[] = [];
	for (const file of routeFiles('src/routes')) {
		const route = '/' + relative('src/routes', file).split(sep).slice(0, -1).join('/');
		if (file.endsWith('+server.ts')) {
			for (const [, name] of readFileSync(file, 'utf8').matchAll(HTTP_EXPORTS)) {
				endpoints.push({ key: `${name} ${route}`, file, route, kind: 'method', name: name! });
			}
		} else {
			const actions = (await routeModule(file)).actions as Record<string, unknown> | undefined;
			for (const name of Object.keys(actions ?? {})) {
				endpoints.push({ key: `action ${name} ${route}`, file, route, kind: 'action', name });
			}
		}
	}
	return endpoints;
}

/** The route's params filled from `ids` (`{ routeId: '…' }`), and the concrete path. */
export function concrete(route: string, ids: Record<string, string>) {
	const params = Object.fromEntries(
		[...route.matchAll(/\[(\w+)(?:=\w+)?\]/g)].map(([, name]) => [name!, ids[name!] ?? 'x'])
	);
	const path = route
		.replace(/\[\.\.\.\w+\]/, 'nowhere')
		.replace(/\[(\w+)(?:=\w+)?\]/g, (_, name: string) => params[name]!);
	return { params, path };
}
