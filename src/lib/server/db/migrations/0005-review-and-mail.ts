import { DataTypes, type QueryInterface } from 'sequelize';

// Review (issue 15): comments, the review history, the outbox of mails, what the local SMTP fake
// received, and each person's mail choices. All new tables, no new columns on `routes` or `users`:
// SQLite drops a column by rebuilding the table, and rebuilding `routes` or `users` with foreign
// keys on would cascade into their children, so `down` could not be honest. A route's approved
// version is not stored either: it is the version of its latest `approve` review event.
export async function up(qi: QueryInterface) {
	const id = { type: DataTypes.UUID, primaryKey: true, allowNull: false };
	const person = (allowNull: boolean) => ({
		type: DataTypes.UUID,
		allowNull,
		references: { model: 'users', key: 'id' },
		onDelete: allowNull ? 'SET NULL' : 'CASCADE'
	});
	const route = {
		type: DataTypes.UUID,
		allowNull: false,
		references: { model: 'routes', key: 'id' },
		onDelete: 'CASCADE'
	};
	await qi.createTable('comments', {
		id,
		routeId: route,
		// The step's id in the route document; null for a comment on the whole route.
		stepKey: { type: DataTypes.STRING(64), allowNull: true },
		replyToId: {
			type: DataTypes.UUID,
			allowNull: true,
			references: { model: 'comments', key: 'id' },
			onDelete: 'CASCADE'
		},
		authorId: person(true),
		body: { type: DataTypes.TEXT, allowNull: false },
		resolved: { type: DataTypes.BOOLEAN, allowNull: false, defaultValue: false },
		resolvedById: person(true),
		editedAt: { type: DataTypes.DATE, allowNull: true },
		createdAt: { type: DataTypes.DATE, allowNull: false },
		updatedAt: { type: DataTypes.DATE, allowNull: false }
	});
	await qi.addIndex('comments', ['routeId', 'createdAt']);

	await qi.createTable('review_events', {
		id,
		routeId: route,
		actorId: person(true),
		action: { type: DataTypes.STRING(24), allowNull: false },
		reviewerIds: { type: DataTypes.JSON, allowNull: true },
		note: { type: DataTypes.TEXT, allowNull: true },
		version: { type: DataTypes.INTEGER, allowNull: false },
		createdAt: { type: DataTypes.DATE, allowNull: false }
	});
	await qi.addIndex('review_events', ['routeId', 'createdAt']);

	await qi.createTable('outbox_messages', {
		id,
		// Whose outbox it is: leads read their teams' messages (GET /api/outbox).
		teamId: {
			type: DataTypes.UUID,
			allowNull: false,
			references: { model: 'teams', key: 'id' },
			onDelete: 'CASCADE'
		},
		to: { type: DataTypes.STRING(320), allowNull: false },
		subject: { type: DataTypes.STRING(300), allowNull: false },
		text: { type: DataTypes.TEXT, allowNull: false },
		status: { type: DataTypes.STRING(16), allowNull: false, defaultValue: 'queued' },
		attempts: { type: DataTypes.INTEGER, allowNull: false, defaultValue: 0 },
		lastError: { type: DataTypes.TEXT, allowNull: true },
		// When the sender may next try; a claim pushes it forward (the lease), so a sender that
		// dies mid-send leaves the message to be tried again once the lease runs out.
		nextAttemptAt: { type: DataTypes.DATE, allowNull: false },
		claimedBy: { type: DataTypes.STRING(64), allowNull: true },
		sentAt: { type: DataTypes.DATE, allowNull: true },
		createdAt: { type: DataTypes.DATE, allowNull: false },
		updatedAt: { type: DataTypes.DATE, allowNull: false }
	});
	await qi.addIndex('outbox_messages', ['status', 'nextAttemptAt']);
	await qi.addIndex('outbox_messages', ['teamId', 'createdAt']);

	await qi.createTable('received_mails', {
		id,
		messageId: { type: DataTypes.STRING(300), allowNull: true },
		from: { type: DataTypes.STRING(320), allowNull: true },
		to: { type: DataTypes.STRING(2000), allowNull: false },
		subject: { type: DataTypes.STRING(300), allowNull: false },
		text: { type: DataTypes.TEXT, allowNull: false },
		receivedAt: { type: DataTypes.DATE, allowNull: false }
	});
	await qi.addIndex('received_mails', ['receivedAt']);

	await qi.createTable('mail_preferences', {
		userId: { ...person(false), primaryKey: true },
		commentMails: { type: DataTypes.BOOLEAN, allowNull: false, defaultValue: true },
		createdAt: { type: DataTypes.DATE, allowNull: false },
		updatedAt: { type: DataTypes.DATE, allowNull: false }
	});
}

export async function down(qi: QueryInterface) {
	await qi.dropTable('mail_preferences');
	await qi.dropTable('received_mails');
	await qi.dropTable('outbox_messages');
	await qi.dropTable('review_events');
	await qi.dropTable('comments');
}
