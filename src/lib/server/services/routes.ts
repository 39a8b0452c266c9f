import type { Transaction } from 'sequelize';
import type { RouteDocument } from '../../route/document';
import { FIELD_LIMITS, withSuffix } from '../../schemas/limits';
import type { SessionUser } from '../../types';
import { dbReady, Intermediate, PlannedRoute, Project, Route, Step } from '../db';
import { assertRouteWithinLimits } from '../route-limits';
import { recordActivity } from './activity';
import { assertSavedConditionsOfTeam } from './library-links';
import { endApproval } from './review-actions';

export type RouteSummary = {
	id: string;
	name: string;
	status: string;
	version: number;
	updatedAt: Date;
	archived: boolean;
};

export class VersionConflict extends Error {
	constructor(readonly currentVersion: number) {
		super(`The route was changed by someone else (now at version ${currentVersion}).`);
	}
}

function summarise(route: Route): RouteSummary {
	return {
		id: route.id,
		name: route.name,
		status: route.status,
		version: route.version,
		updatedAt: route.updatedAt,
		archived: route.archivedAt !== null
	};
}

export async function listRoutes(
	projectId: string,
	options: { includeArchived?: boolean } = {}
): Promise<RouteSummary[]> {
	await dbReady();
	const routes = await Route.findAll({
		where: { projectId, ...(options.includeArchived ? {} : { archivedAt: null }) },
		order: [['updatedAt', 'DESC']]
	});
	return routes.map(summarise);
}

async function writeChildren(routeId: string, doc: RouteDocument, transaction: Transaction) {
	await Intermediate.destroy({ where: { routeId }, transaction });
	await Step.destroy({ where: { routeId }, transaction });
	await Intermediate.bulkCreate(
		doc.intermediates.map((node, ordinal) => ({
			routeId,
			key: node.id,
			label: node.label ?? null,
			structure: node.structure,
			canonical: null,
			positionX: node.position?.x ?? null,
			positionY: node.position?.y ?? null,
			ordinal
		})),
		{ transaction }
	);
	await Step.bulkCreate(
		doc.steps.map((step, ordinal) => ({
			routeId,
			key: step.id,
			fromKeys: step.from,
			toKey: step.to,
			reagents: step.reagents ?? null,
			conditionIds: step.conditions ?? null,
			notes: step.notes ?? null,
			quantities: storedQuantities(step),
			intent: step.intent ?? null,
			savedConditionId: step.savedCondition ?? null,
			ordinal
		})),
		{ transaction }
	);
}

type RouteStep = RouteDocument['steps'][number];
type StepQuantities = Pick<RouteStep, 'quantities' | 'waterRemoval'>;

/**
 * A step's quantities and water removal share the steps table's one JSON column (issue 14), e.g.
 * `{ materials: [{ name: 'toluene', role: 'solvent', volume: 75 }], waterRemoval: { solvent: 'toluene' } }`.
 */
function storedQuantities(step: RouteStep): Record<string, unknown> | null {
	if (!step.quantities && !step.waterRemoval) {
		return null;
	}
	return { materials: step.quantities, waterRemoval: step.waterRemoval };
}

/** The column read back; it only ever holds what a validated document wrote. */
function quantitiesOf(stored: Record<string, unknown> | null): StepQuantities {
	const { materials, waterRemoval } = (stored ?? {}) as {
		materials?: StepQuantities['quantities'];
		waterRemoval?: StepQuantities['waterRemoval'];
	};
	return {
		...(materials?.length ? { quantities: materials } : {}),
		...(waterRemoval ? { waterRemoval } : {})
	};
}

/** Where a route saved from a plan came from: the planned route and the plan's rank. */
export type PlanOrigin = { from: Route; rank: number };

/** Creates a route from a validated route document; `origin` links a saved plan to its route. */
export async function createRoute(
	actor: SessionUser,
	project: Project,
	doc: RouteDocument,
	origin?: PlanOrigin
): Promise<Route> {
	assertRouteWithinLimits(doc);
	await dbReady();
	return Route.sequelize!.transaction(async (transaction) => {
		await assertSavedConditionsOfTeam(doc, project.teamId, transaction);
		const route = await Route.create(
			{ projectId: project.id, name: doc.name, createdById: actor.id, archivedAt: null },
			{ transaction }
		);
		await writeChildren(route.id, doc, transaction);
		if (origin) {
			await PlannedRoute.create(
				{ routeId: route.id, plannedFromId: origin.from.id, rank: origin.rank },
				{ transaction }
			);
		}
		await recordActivity(
			{
				teamId: project.teamId,
				projectId: project.id,
				actorId: actor.id,
				kind: origin ? 'route.planned' : 'route.created',
				summary: origin
					? `${actor.name} saved plan ${origin.rank} for “${origin.from.name}” as the route “${route.name}”.`
					: `${actor.name} created the route “${route.name}”.`,
				details: {
					routeId: route.id,
					...(origin ? { plannedFromId: origin.from.id, rank: origin.rank } : {})
				}
			},
			transaction
		);
		return route;
	});
}

/** The name of a route saved from plan `rank`, cut so the suffix fits in a route name. */
export function plannedRouteName(name: string, rank: number): string {
	return withSuffix(name, ` (protected, plan ${rank})`, FIELD_LIMITS.routeName.max);
}

export type RouteLink = { id: string; name: string; rank: number };
export type RouteLinks = { plannedFrom: RouteLink | null; plannedVersions: RouteLink[] };

/** The route a planned route was saved from, and the routes saved from this one's plans. */
export async function routeLinks(route: Route): Promise<RouteLinks> {
	await dbReady();
	const [origin, versions] = await Promise.all([
		PlannedRoute.findOne({
			where: { routeId: route.id },
			include: [{ model: Route, as: 'plannedFrom' }]
		}),
		PlannedRoute.findAll({
			where: { plannedFromId: route.id },
			include: [{ model: Route, as: 'route' }],
			order: [['createdAt', 'ASC']]
		})
	]);
	const from = origin?.plannedFrom;
	return {
		plannedFrom: from && origin ? { id: from.id, name: from.name, rank: origin.rank } : null,
		plannedVersions: versions.flatMap((v) =>
			v.route ? [{ id: v.route.id, name: v.route.name, rank: v.rank }] : []
		)
	};
}

/** The stored route as a route document, children in the order they were saved. */
export async function routeDocument(route: Route): Promise<RouteDocument> {
	const [intermediates, steps] = await Promise.all([
		Intermediate.findAll({ where: { routeId: route.id }, order: [['ordinal', 'ASC']] }),
		Step.findAll({ where: { routeId: route.id }, order: [['ordinal', 'ASC']] })
	]);
	return {
		name: route.name,
		intermediates: intermediates.map((node) => ({
			id: node.key,
			...(node.label ? { label: node.label } : {}),
			structure: node.structure,
			...(node.positionX !== null && node.positionY !== null
				? { position: { x: node.positionX, y: node.positionY } }
				: {})
		})),
		steps: steps.map((step) => ({
			id: step.key,
			from: step.fromKeys,
			to: step.toKey,
			...(step.reagents ? { reagents: step.reagents } : {}),
			...(step.conditionIds?.length ? { conditions: step.conditionIds } : {}),
			...(step.notes ? { notes: step.notes } : {}),
			...(step.intent ? { intent: step.intent } : {}),
			...(step.savedConditionId ? { savedCondition: step.savedConditionId } : {}),
			...quantitiesOf(step.quantities)
		}))
	};
}

/**
 * The stored route as a document, provided it is still at `version`; otherwise VersionConflict.
 * Saves bump the version in the same transaction as they replace the children, so a version
 * unchanged after the children were read means no save landed in between.
 */
export async function routeDocumentAt(route: Route, version: number): Promise<RouteDocument> {
	if (route.version !== version) {
		throw new VersionConflict(route.version);
	}
	const document = await routeDocument(route);
	const now = await Route.findByPk(route.id, { attributes: ['version'] });
	if (now?.version !== version) {
		throw new VersionConflict(now?.version ?? route.version);
	}
	return document;
}

/**
 * Replaces the route's content when `expectedVersion` is still current; otherwise writes
 * nothing and throws VersionConflict. Returns the new version. An approved route goes back to
 * draft in the same transaction; a route in review keeps its status.
 */
export async function saveRoute(
	actor: SessionUser,
	route: Route,
	expectedVersion: number,
	doc: RouteDocument,
	teamId: string
): Promise<number> {
	assertRouteWithinLimits(doc);
	await dbReady();
	return Route.sequelize!.transaction(async (transaction) => {
		await assertSavedConditionsOfTeam(doc, teamId, transaction);
		// The version test and the increment are one UPDATE, so two saves cannot both win.
		const [claimed] = await Route.update(
			{ version: expectedVersion + 1, name: doc.name },
			{ where: { id: route.id, version: expectedVersion }, transaction }
		);
		if (claimed === 0) {
			const current = await Route.findByPk(route.id, { transaction });
			throw new VersionConflict(current?.version ?? route.version);
		}
		await writeChildren(route.id, doc, transaction);
		await recordActivity(
			{
				teamId,
				projectId: route.projectId,
				actorId: actor.id,
				kind: 'route.saved',
				summary: `${actor.name} saved the route “${doc.name}” (version ${expectedVersion + 1}).`,
				details: { routeId: route.id }
			},
			transaction
		);
		await endApproval(actor, route, doc.name, expectedVersion, teamId, transaction);
		return expectedVersion + 1;
	});
}

/** Archives or restores a route; archived routes leave the project's list but stay readable. */
export async function setRouteArchived(
	actor: SessionUser,
	route: Route,
	archived: boolean,
	teamId: string
): Promise<void> {
	await dbReady();
	await Route.sequelize!.transaction(async (transaction) => {
		await route.update({ archivedAt: archived ? new Date() : null }, { transaction });
		await recordActivity(
			{
				teamId,
				projectId: route.projectId,
				actorId: actor.id,
				kind: archived ? 'route.archived' : 'route.restored',
				summary: `${actor.name} ${archived ? 'archived' : 'restored'} the route “${route.name}”.`,
				details: { routeId: route.id }
			},
			transaction
		);
	});
}

/** A new draft route in the same project with a copy of the route's document. */
export async function duplicateRoute(
	actor: SessionUser,
	project: Project,
	route: Route
): Promise<Route> {
	const doc = await routeDocument(route);
	const name = withSuffix(doc.name, ' (copy)', FIELD_LIMITS.routeName.max);
	return createRoute(actor, project, { ...doc, name });
}
