import type { QueryInterface } from 'sequelize';
import * as foundation from './0001-foundation';
import * as routes from './0002-routes';
import * as plannedRoutes from './0003-planned-routes';
import * as sessionsAndSignInLimits from './0004-sessions-and-sign-in-limits';
import * as reviewAndMail from './0005-review-and-mail';
import * as libraryAndTeamRules from './0006-library-and-team-rules';

export type Migration = {
	name: string;
	up: (qi: QueryInterface) => Promise<void>;
	down: (qi: QueryInterface) => Promise<void>;
};

/**
 * Every migration, in order. Listed by import (not read from disk) so the bundler carries them
 * into the built server, where the .ts files do not exist. Append new ones; never reorder.
 */
export const migrations: Migration[] = [
	{ name: '0001-foundation', ...foundation },
	{ name: '0002-routes', ...routes },
	{ name: '0003-planned-routes', ...plannedRoutes },
	{ name: '0004-sessions-and-sign-in-limits', ...sessionsAndSignInLimits },
	{ name: '0005-review-and-mail', ...reviewAndMail },
	{ name: '0006-library-and-team-rules', ...libraryAndTeamRules }
];
