import type { Sequelize } from 'sequelize';
import { ActivityEvent } from './activity-event';
import { ApiToken } from './api-token';
import { Membership } from './membership';
import { Project } from './project';
import { SetPasswordLink } from './set-password-link';
import { Team } from './team';
import { User } from './user';

export { ActivityEvent, ApiToken, Membership, Project, SetPasswordLink, Team, User };

/** Binds every model to one Sequelize instance and wires the associations. */
export function initModels(sequelize: Sequelize) {
	for (const model of [User, Team, Membership, ApiToken, SetPasswordLink, Project, ActivityEvent]) {
		model.initModel(sequelize);
	}
	Membership.belongsTo(User, { as: 'user', foreignKey: 'userId' });
	Membership.belongsTo(Team, { as: 'team', foreignKey: 'teamId' });
	User.hasMany(Membership, { as: 'memberships', foreignKey: 'userId' });
	Team.hasMany(Membership, { as: 'memberships', foreignKey: 'teamId' });
	Project.belongsTo(Team, { as: 'team', foreignKey: 'teamId' });
	ActivityEvent.belongsTo(User, { as: 'actor', foreignKey: 'actorId' });
}
