// The JSON API's error shape and the codes both sides act on, spelled once for server and browser.

/** The one error shape every `/api` response uses: `{ error: { code, message, details? } }`. */
export type ApiErrorBody = { error: { code: string; message: string; details?: unknown } };

/**
 * 409 for a write sent against a route version that is no longer the stored one (`PUT
 * /api/routes/{id}`, saving a plan); `details` says which version is stored now.
 */
export const VERSION_CONFLICT = 'version_conflict';
export type VersionConflictDetails = { currentVersion: number };

/** 409 for a review action that does not fit the route's status (`POST /api/routes/{id}/review`). */
export const INVALID_TRANSITION = 'invalid_transition';
