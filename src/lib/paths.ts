/** Every in-app link, built in one place so a moved page is one edit. */
export const paths = {
	home: () => '/',
	signIn: (redirectTo?: string) =>
		redirectTo && redirectTo !== '/' ? `/signin?redirectTo=${encodeURIComponent(redirectTo)}` : '/signin',
	signOut: () => '/signout',
	projects: () => '/projects',
	project: (projectId: string) => `/projects/${projectId}`,
	route: (routeId: string) => `/routes/${routeId}`,
	routeExport: (routeId: string, format: 'sdf' | 'json') => `/api/routes/${routeId}/export?format=${format}`,
	team: (teamId: string) => `/teams/${teamId}`,
	account: () => '/account',
	setPassword: (token: string) => `/set-password/${token}`
};

/** Only same-site paths are followed after sign-in, never another origin. */
export function safeRedirectTarget(value: string | null | undefined): string {
	if (!value || !value.startsWith('/') || value.startsWith('//') || value.startsWith('/\\')) {
		return paths.projects();
	}
	return value;
}
