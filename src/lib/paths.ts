/** Every in-app link, built in one place so a moved page is one edit. */
export const paths = {
	home: () => '/',
	signIn: (redirectTo?: string) =>
		redirectTo && redirectTo !== '/'
			? `/signin?redirectTo=${encodeURIComponent(redirectTo)}`
			: '/signin',
	signOut: () => '/signout',
	projects: () => '/projects',
	project: (projectId: string) => `/projects/${projectId}`,
	route: (routeId: string) => `/routes/${routeId}`,
	routeReport: (routeId: string) => `/routes/${routeId}/report`,
	routeComments: (routeId: string) => `/api/routes/${routeId}/comments`,
	routeReview: (routeId: string) => `/api/routes/${routeId}/review`,
	comment: (commentId: string) => `/api/comments/${commentId}`,
	outbox: () => '/outbox',
	library: () => '/library',
	libraryApi: () => '/api/library',
	savedCondition: (conditionId: string) => `/api/library/${conditionId}`,
	approveSavedCondition: (conditionId: string) => `/api/library/${conditionId}/approve`,
	libraryExport: (teamId: string) => `/api/library/export?teamId=${teamId}`,
	libraryImport: () => '/api/library/import',
	teamRules: (teamId: string) => `/teams/${teamId}/rules`,
	teamRulesApi: (teamId: string) => `/api/teams/${teamId}/rules`,
	teamRuleApi: (teamId: string, overrideId: string) => `/api/teams/${teamId}/rules/${overrideId}`,
	routeExport: (routeId: string, format: 'sdf' | 'json') =>
		`/api/routes/${routeId}/export?format=${format}`,
	team: (teamId: string) => `/teams/${teamId}`,
	account: () => '/account',
	setPassword: (token: string) => `/set-password/${token}`
};

// Any origin works as the base: only whether the target stays on it matters.
const SAME_ORIGIN_PROBE = 'http://orthogon.invalid';

/**
 * The in-app path to go to after sign-in, or the projects page. The target is parsed with `URL`,
 * as a browser would read it (tabs and newlines dropped, a backslash read as a slash), and kept
 * only when it stays on this origin; `/<tab>/evil.example`, `//evil.example` and `https://evil.example` all fall
 * back. The answer is the parsed path, so it carries no raw control characters into a header.
 */
export function safeRedirectTarget(value: string | null | undefined): string {
	if (!value || !value.startsWith('/')) {
		return paths.projects();
	}
	let target: URL;
	try {
		target = new URL(value, SAME_ORIGIN_PROBE);
	} catch {
		return paths.projects();
	}
	if (target.origin !== SAME_ORIGIN_PROBE) {
		return paths.projects();
	}
	return target.pathname + target.search + target.hash;
}
