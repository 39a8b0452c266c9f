import { Op, type Transaction } from 'sequelize';
import type { ReviewAnswer } from '../../api/answers';
import { VERSION_CONFLICT, type VersionConflictDetails } from '../../api/errors';
import { can, type Role } from '../../policy';
import { REVIEW_TRANSITIONS, type ReviewAction, type ReviewBody } from '../../review/contract';
import type { SessionUser } from '../../types';
import { ApiFailure } from '../api';
import { normaliseEmail } from '../auth/credentials';
import { dbReady, ReviewEvent, Route, type Project } from '../db';
import { queueMail } from '../mail/outbox';
import { recordActivity } from './activity';
import { activitySummary, returnedToDraftSummary } from './review-summaries';
import { reviewMailDrafts } from './review-mails';
import { forbiddenAction, invalidTransition } from './review-refusals';
import { reviewCandidates, type ReviewCandidate } from './review';

// Taking a review action (issue 15): request, approve, request changes, withdraw. The status
// moves by one conditional UPDATE, so two servers or two clicks cannot both move it, and the
// history line, the activity line and the mails commit with it or not at all.

/** The activity kind each action records. */
export const REVIEW_ACTIVITY_KINDS: Record<ReviewAction, string> = {
	request: 'review.requested',
	approve: 'review.approved',
	'request-changes': 'review.changes-requested',
	withdraw: 'review.withdrawn'
};

function invalid(code: string, message: string, details?: unknown): ApiFailure {
	return new ApiFailure(422, code, message, details);
}

/** The requested reviewers as team members who may review; 422 naming the first who may not. */
async function requestedReviewers(
	emails: string[] | undefined,
	teamId: string
): Promise<ReviewCandidate[]> {
	if (!emails?.length) {
		throw invalid(
			'reviewers_required',
			'Name at least one reviewer: the e-mail of a team member who may review (a reviewer or a lead).'
		);
	}
	const candidates = new Map(
		(await reviewCandidates(teamId)).map((person) => [normaliseEmail(person.email), person])
	);
	const chosen = new Map<string, ReviewCandidate>();
	for (const email of emails) {
		const person = candidates.get(normaliseEmail(email));
		if (!person) {
			throw invalid(
				'not_a_reviewer',
				`${email} cannot review this route: only members of the team who are reviewers or leads can.`,
				{ email }
			);
		}
		chosen.set(person.id, person);
	}
	return [...chosen.values()];
}

function versionConflict(currentVersion: number, action: ReviewAction): ApiFailure {
	const details: VersionConflictDetails = { currentVersion };
	const what = action === 'approve' ? 'approve' : 'act on';
	return new ApiFailure(
		409,
		VERSION_CONFLICT,
		`The route was changed since you opened it (now at version ${currentVersion}); reload it and read the changes before you ${what} it.`,
		details
	);
}

/**
 * Moves the status when it is still one the action may start from (and, when the client sent
 * one, the version is still the one it saw); otherwise says which of the two changed. Returns
 * the route as stored after the move.
 */
async function claimTransition(
	route: Route,
	action: ReviewAction,
	expectedVersion: number | undefined,
	transaction: Transaction
): Promise<Pick<Route, 'id' | 'name' | 'createdById' | 'version'>> {
	const { from, to } = REVIEW_TRANSITIONS[action];
	const [moved] = await Route.update(
		{ status: to },
		{
			where: {
				id: route.id,
				status: { [Op.in]: [...from] },
				...(expectedVersion === undefined ? {} : { version: expectedVersion })
			},
			transaction
		}
	);
	// Read after the UPDATE: it holds the row, so no save can slip in before the commit.
	const now = await Route.findByPk(route.id, {
		attributes: ['id', 'name', 'createdById', 'status', 'version'],
		transaction
	});
	if (!now) {
		throw new ApiFailure(404, 'not_found', 'That route does not exist, or is not shared with you.');
	}
	if (moved === 0) {
		if (!from.includes(now.status)) {
			throw invalidTransition(now.status, action);
		}
		throw versionConflict(now.version, action);
	}
	return now;
}

/**
 * Takes review `body.action` on the route as `actor` with `role` in the route's team: 403 when
 * the role lacks the action's grant, 409 `invalid_transition` when the status does not fit, 422
 * for missing reviewers or note, 409 `version_conflict` for a stale `version`. The route's
 * `version` is not changed: it guards the document, not the review.
 */
export async function takeReviewAction(
	actor: SessionUser,
	role: Role,
	route: Route,
	project: Project,
	body: ReviewBody
): Promise<ReviewAnswer> {
	const { action } = body;
	const transition = REVIEW_TRANSITIONS[action];
	if (!can(role, transition.grant)) {
		throw forbiddenAction(role, action);
	}
	if (!transition.from.includes(route.status)) {
		throw invalidTransition(route.status, action);
	}
	const note = body.note ? body.note : null;
	if (action === 'request-changes' && !note) {
		throw invalid('note_required', 'Say what should change: a request for changes needs a note.');
	}
	const reviewers =
		action === 'request' ? await requestedReviewers(body.reviewers, project.teamId) : [];
	if (body.version !== undefined && body.version !== route.version) {
		throw versionConflict(route.version, action);
	}
	await dbReady();
	return Route.sequelize!.transaction(async (transaction) => {
		// The route as it stands once the status moved: a save may have renamed it meanwhile.
		const current = await claimTransition(route, action, body.version, transaction);
		const { version } = current;
		await ReviewEvent.create(
			{
				routeId: route.id,
				actorId: actor.id,
				action,
				reviewerIds: action === 'request' ? reviewers.map((person) => person.id) : null,
				note,
				version
			},
			{ transaction }
		);
		await recordActivity(
			{
				teamId: project.teamId,
				projectId: project.id,
				routeId: route.id,
				actorId: actor.id,
				kind: REVIEW_ACTIVITY_KINDS[action],
				summary: activitySummary({
					action,
					actor,
					routeName: current.name,
					version,
					note,
					reviewers
				}),
				details: {
					routeId: route.id,
					version,
					...(reviewers.length ? { reviewerIds: reviewers.map((person) => person.id) } : {})
				}
			},
			transaction
		);
		const context = { action, actor, route: current, project, version, note, reviewers };
		await queueMail(await reviewMailDrafts(context, transaction), transaction);
		return { status: transition.to, version };
	});
}

/**
 * An approved route that is edited goes back to draft, in the save's transaction (saveRoute in
 * routes.ts). The row is already held by the save's UPDATE, so an approval cannot land between
 * the two. `approvedVersion` is the version the save replaced: an approved route's version only
 * changes by a save, and that save ends the approval. The history line gets the new version.
 */
export async function endApproval(
	actor: SessionUser,
	route: Route,
	name: string,
	approvedVersion: number,
	teamId: string,
	transaction: Transaction
): Promise<void> {
	const [ended] = await Route.update(
		{ status: 'draft' },
		{ where: { id: route.id, status: 'approved' }, transaction }
	);
	if (ended === 0) {
		return;
	}
	const version = approvedVersion + 1;
	await ReviewEvent.create(
		{
			routeId: route.id,
			actorId: actor.id,
			action: 'returned-to-draft',
			reviewerIds: null,
			note: null,
			version
		},
		{ transaction }
	);
	await recordActivity(
		{
			teamId,
			projectId: route.projectId,
			routeId: route.id,
			actorId: actor.id,
			kind: 'review.returned-to-draft',
			summary: returnedToDraftSummary(actor, name, approvedVersion, version),
			details: { routeId: route.id, version, approvedVersion }
		},
		transaction
	);
}
