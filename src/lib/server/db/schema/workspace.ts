import {
	index,
	doublePrecision,
	jsonb,
	pgEnum,
	pgTable,
	primaryKey,
	text,
	timestamp,
	uuid
} from 'drizzle-orm/pg-core';
import type { PumpPoint } from '$lib/calc';
import { belongsTo, createdAt, updatedAt, uuidId } from './columns';
import { belongsToUser, users } from './auth';

export const roleEnum = pgEnum('workspace_role', ['owner', 'editor', 'viewer']);

/** A member's role in a workspace (or a guest's on one shared site); it lives with the column that stores it. */
export type Role = (typeof roleEnum.enumValues)[number];

/** The rank order: each role may do everything the roles below it may. */
const ROLE_RANK: Record<Role, number> = { viewer: 1, editor: 2, owner: 3 };

/** Whether someone with `role` may do what needs `needed`; the guard and the services ask the same question. */
export const roleAtLeast = (role: Role, needed: Role): boolean => ROLE_RANK[role] >= ROLE_RANK[needed];

/** A farm, a school program or a consultancy: the unit that owns sites, tariffs and bills. */
export const workspaces = pgTable('workspace', {
	id: uuidId(),
	name: text('name').notNull(),
	/** Set when an owner deletes the workspace: it is kept (and can be restored) until then, then purged. */
	deleteAfter: timestamp('delete_after', { mode: 'date' }),
	createdAt: createdAt()
});

export const memberships = pgTable(
	'membership',
	{
		workspaceId: belongsTo('workspace_id', () => workspaces.id),
		userId: belongsToUser('user_id'),
		role: roleEnum('role').notNull(),
		createdAt: createdAt()
	},
	(m) => [primaryKey({ columns: [m.workspaceId, m.userId] }), index('membership_user_idx').on(m.userId)]
);

/** An e-mailed invitation: the link carries a random token whose SHA-256 is stored; it works once, until it expires. */
export const invitations = pgTable(
	'invitation',
	{
		id: uuidId(),
		workspaceId: belongsTo('workspace_id', () => workspaces.id),
		email: text('email').notNull(),
		role: roleEnum('role').notNull(),
		/** Set for a site-level share: the invitee gets that site only, as editor or viewer. */
		siteId: uuid('site_id'),
		tokenHash: text('token_hash').notNull().unique(),
		invitedBy: text('invited_by').references(() => users.id, { onDelete: 'set null' }),
		expiresAt: timestamp('expires_at', { mode: 'date' }).notNull(),
		acceptedAt: timestamp('accepted_at', { mode: 'date' }),
		revokedAt: timestamp('revoked_at', { mode: 'date' }),
		createdAt: createdAt()
	},
	(i) => [index('invitation_workspace_idx').on(i.workspaceId)]
);

/** An in-app notice to a workspace (the same news also goes out by e-mail). */
export const notices = pgTable(
	'notice',
	{
		id: uuidId(),
		workspaceId: belongsTo('workspace_id', () => workspaces.id),
		/** Makes a retried job idempotent: the same news is recorded once. */
		dedupeKey: text('dedupe_key').notNull().unique(),
		title: text('title').notNull(),
		body: text('body').notNull(),
		createdAt: createdAt()
	},
	(n) => [index('notice_workspace_idx').on(n.workspaceId, n.createdAt)]
);

/** An air pump a workspace entered from its data sheet: flow against pressure, and its watts. */
export const airPumps = pgTable(
	'air_pump',
	{
		id: uuidId(),
		workspaceId: belongsTo('workspace_id', () => workspaces.id),
		name: text('name').notNull(),
		points: jsonb('points').$type<PumpPoint[]>().notNull(),
		/** Input watts at the rated pressure; null: the wire-to-air efficiency stands in. */
		inputWatts: doublePrecision('input_watts'),
		wireToAirPercent: doublePrecision('wire_to_air_percent').notNull().default(25),
		createdAt: createdAt(),
		updatedAt: updatedAt()
	},
	(p) => [index('air_pump_workspace_idx').on(p.workspaceId)]
);
