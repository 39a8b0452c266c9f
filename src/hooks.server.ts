import type { HandleServerError, ServerInit } from '@sveltejs/kit';
import { sequence } from '@sveltejs/kit/hooks';
import { codeForStatus } from '$lib/server/api';
import { authHandle } from '$lib/server/auth/auth';
import { dbReady } from '$lib/server/db';
import { DatabaseBusy, isDatabaseBusy } from '$lib/server/db/write-queue';
import { seedDemoIfEmpty } from '$lib/server/db/seed-demo';
import { shapeApiErrors } from '$lib/server/hooks/api-errors';
import { closeAfterUnreadBody } from '$lib/server/hooks/early-answers';
import { requireFormBodies } from '$lib/server/hooks/form-bodies';
import { checkFormOrigin } from '$lib/server/hooks/form-origin';
import { guardPages } from '$lib/server/hooks/guard-pages';
import { identify } from '$lib/server/hooks/identify';
import { securityHeaders } from '$lib/server/hooks/security-headers';
import { limitScriptedSignIn } from '$lib/server/hooks/sign-in-limit';
import { startMail, stopMail } from '$lib/server/mail/start';

export const init: ServerInit = async () => {
	await dbReady();
	if (process.env.ORTHOGON_DEMO !== '0') {
		await seedDemoIfEmpty();
	}
	// The outbox sender and (without SMTP_URL) the local mail catcher run beside every app server;
	// adapter-node announces a graceful stop with this event, after the HTTP server has closed.
	const mail = await startMail();
	process.once('sveltekit:shutdown', () => {
		void stopMail(mail);
	});
};

// One handle per concern, in the order a request meets them; each lives in $lib/server/hooks.
export const handle = sequence(
	closeAfterUnreadBody,
	securityHeaders,
	checkFormOrigin,
	requireFormBodies,
	limitScriptedSignIn,
	authHandle,
	identify,
	guardPages,
	shapeApiErrors
);

export const handleError: HandleServerError = ({ error, status, message }) => {
	// Pages cannot change the status here; they at least say what happened and that it may pass.
	if (isDatabaseBusy(error)) {
		return { message: new DatabaseBusy().message, code: 'database_busy' };
	}
	if (status !== 404) {
		console.error('[server]', error);
	}
	return { message: status === 404 ? 'Page not found.' : message, code: codeForStatus(status) };
};
