import type { Sequelize } from 'sequelize';
import { ActivityEvent } from './activity-event';
import { ApiToken } from './api-token';
import { Comment } from './comment';
import { Intermediate } from './intermediate';
import { MailPreference } from './mail-preference';
import { Membership } from './membership';
import { OutboxMessage } from './outbox-message';
import { PlannedRoute } from './planned-route';
import { Project } from './project';
import { ReceivedMail } from './received-mail';
import { ReviewEvent } from './review-event';
import { Route } from './route';
import { SavedCondition } from './saved-condition';
import { Session } from './session';
import { SetPasswordLink } from './set-password-link';
import { Step } from './step';
import { Team } from './team';
import { TeamRuleOverride } from './team-rule-override';
import { User } from './user';

export {
	ActivityEvent,
	ApiToken,
	Comment,
	Intermediate,
	MailPreference,
	Membership,
	OutboxMessage,
	PlannedRoute,
	Project,
	ReceivedMail,
	ReviewEvent,
	Route,
	SavedCondition,
	Session,
	SetPasswordLink,
	Step,
	Team,
	TeamRuleOverride,
	User
};
export { ROUTE_STATUSES, type RouteStatus } from './route';

/** Binds every model to one Sequelize instance and wires the associations. */
export function initModels(sequelize: Sequelize) {
	for (const model of [
		User,
		Team,
		Membership,
		ApiToken,
		SetPasswordLink,
		Project,
		ActivityEvent,
		Route,
		Intermediate,
		Step,
		PlannedRoute,
		Session,
		Comment,
		ReviewEvent,
		OutboxMessage,
		ReceivedMail,
		MailPreference,
		SavedCondition,
		TeamRuleOverride
	]) {
		model.initModel(sequelize);
	}
	Membership.belongsTo(User, { as: 'user', foreignKey: 'userId' });
	Membership.belongsTo(Team, { as: 'team', foreignKey: 'teamId' });
	User.hasMany(Membership, { as: 'memberships', foreignKey: 'userId' });
	Team.hasMany(Membership, { as: 'memberships', foreignKey: 'teamId' });
	Project.belongsTo(Team, { as: 'team', foreignKey: 'teamId' });
	ActivityEvent.belongsTo(User, { as: 'actor', foreignKey: 'actorId' });
	Route.belongsTo(Project, { as: 'project', foreignKey: 'projectId' });
	Route.hasMany(Intermediate, { as: 'intermediates', foreignKey: 'routeId' });
	Route.hasMany(Step, { as: 'steps', foreignKey: 'routeId' });
	PlannedRoute.belongsTo(Route, { as: 'route', foreignKey: 'routeId' });
	PlannedRoute.belongsTo(Route, { as: 'plannedFrom', foreignKey: 'plannedFromId' });
	Session.belongsTo(User, { as: 'user', foreignKey: 'userId' });
	Comment.belongsTo(User, { as: 'author', foreignKey: 'authorId' });
	ReviewEvent.belongsTo(User, { as: 'actor', foreignKey: 'actorId' });
	SavedCondition.belongsTo(User, { as: 'author', foreignKey: 'authorId' });
	TeamRuleOverride.belongsTo(User, { as: 'author', foreignKey: 'authorId' });
}
