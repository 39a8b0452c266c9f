import type { SessionUser, TeamOfUser } from '$lib/types';

declare global {
	namespace App {
		interface Error {
			message: string;
			code?: string;
			details?: unknown;
		}
		interface Locals {
			/** Who is asking: from the session cookie, or from a Bearer API token. */
			user: SessionUser | null;
			/** How `user` was established; API tokens never open a browser session. */
			via: 'session' | 'token' | null;
			/** The server-side session behind a cookie sign-in (auth/sessions.ts); null for tokens. */
			sessionId: string | null;
			/**
			 * The caller's teams and roles, loaded on first use and shared by everything that reads
			 * them during this request (auth/memberships.ts); never carried to another request.
			 */
			memberships?: { userId: string; teams: Promise<TeamOfUser[]> };
		}
		interface PageData {
			user?: SessionUser | null;
		}
	}
}

declare module '@auth/core/types' {
	interface Session {
		user: { id: string; name?: string | null; email?: string | null; image?: string | null };
		sessionId?: string;
	}
}

declare module '@auth/core/jwt' {
	interface JWT {
		uid?: string;
		sid?: string;
	}
}

export {};
