import type { Role } from './policy';

/** Who is signed in: what the session and every guard carry. */
export type SessionUser = { id: string; email: string; name: string };

/** One of the user's teams with the user's role there. */
export type TeamOfUser = { id: string; name: string; role: Role };
