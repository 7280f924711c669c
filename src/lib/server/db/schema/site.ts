import {
	boolean,
	index,
	integer,
	jsonb,
	pgEnum,
	pgTable,
	primaryKey,
	text,
	timestamp,
	uuid
} from 'drizzle-orm/pg-core';
import { belongsTo, createdAt, updatedAt, uuidId } from './columns';
import type { AirDesign, EquipmentInput, OneOffCost, SiteWater } from '$lib/calc';
import { belongsToUser, users } from './auth';
import { tariffs } from './tariff';
import { workspaces } from './workspace';

/** A grower's place: a farm, a school garden, a greenhouse. `revision` guards against stale writes. */
export const sites = pgTable(
	'site',
	{
		id: uuidId(),
		workspaceId: belongsTo('workspace_id', () => workspaces.id),
		name: text('name').notNull(),
		address: text('address'),
		timezone: text('timezone').notNull(),
		country: text('country').notNull(),
		region: text('region'),
		supplyVolts: integer('supply_volts'),
		supplyPhases: integer('supply_phases'),
		tariffId: uuid('tariff_id').references(() => tariffs.id, { onDelete: 'set null' }),
		tariffVersion: integer('tariff_version'),
		currency: text('currency').notNull(),
		notes: text('notes'),
		/** The site's altitude and its tanks or ponds with their water and stock (core: siteWaterSchema). */
		water: jsonb('water').$type<SiteWater>().notNull().default({ altitudeM: 0, tanks: [] }),
		revision: integer('revision').notNull().default(1),
		archivedAt: timestamp('archived_at', { mode: 'date' }),
		createdAt: createdAt(),
		updatedAt: updatedAt()
	},
	(s) => [index('site_workspace_idx').on(s.workspaceId), index('site_tariff_idx').on(s.tariffId)]
);

/** One way of equipping a site. Exactly one live scenario per site is the baseline. */
export const scenarios = pgTable(
	'scenario',
	{
		id: uuidId(),
		siteId: belongsTo('site_id', () => sites.id),
		name: text('name').notNull(),
		description: text('description'),
		isBaseline: boolean('is_baseline').notNull().default(false),
		/** Installed (already paid for) or proposed (bought now): see the core's capitalCost. */
		status: text('status', { enum: ['installed', 'proposed'] })
			.notNull()
			.default('proposed'),
		/** Costs paid once when the scenario is carried out: a trench, an outdoor circuit, a visit. */
		oneOffCosts: jsonb('one_off_costs').$type<OneOffCost[]>().notNull().default([]),
		/** The air and water designer's last design for this scenario (core: airDesignSchema), kept to reopen. */
		airDesign: jsonb('air_design').$type<AirDesign>(),
		tariffId: uuid('tariff_id').references(() => tariffs.id, { onDelete: 'set null' }),
		tariffVersion: integer('tariff_version'),
		position: integer('position').notNull().default(0),
		/** Bumped by every change to the scenario or its equipment: the editor's concurrency token. */
		revision: integer('revision').notNull().default(1),
		archivedAt: timestamp('archived_at', { mode: 'date' }),
		/** Deleted scenarios stay for an undo window before they are purged. */
		deletedAt: timestamp('deleted_at', { mode: 'date' }),
		createdAt: createdAt(),
		updatedAt: updatedAt()
	},
	(s) => [index('scenario_site_idx').on(s.siteId)]
);

/**
 * A stored device: the core's equipment, the safety flags, and what the device delivers when known
 * (`waterLpm` a water pump's flow at its duty point, `airLpm` an air pump's free air at its operating
 * pressure, per unit). `fromAirDesign` marks the air pumps the designer put in the list.
 */
export type DeviceSpec = EquipmentInput & {
	inWater?: boolean;
	outdoor?: boolean;
	notes?: string;
	waterLpm?: number;
	airLpm?: number;
	fromAirDesign?: boolean;
};

/** A row of a scenario's equipment list: the core's Equipment shape plus the safety flags. */
export const devices = pgTable(
	'device',
	{
		id: uuidId(),
		scenarioId: belongsTo('scenario_id', () => scenarios.id),
		position: integer('position').notNull(),
		spec: jsonb('spec').$type<DeviceSpec>().notNull(),
		createdAt: createdAt(),
		updatedAt: updatedAt()
	},
	(d) => [index('device_scenario_idx').on(d.scenarioId, d.position)]
);

export const siteRoleEnum = pgEnum('site_role', ['editor', 'viewer']);

/** A site shared with someone outside the workspace (an adviser's client, say), for that site only. */
export const siteGrants = pgTable(
	'site_grant',
	{
		siteId: belongsTo('site_id', () => sites.id),
		userId: belongsToUser('user_id'),
		role: siteRoleEnum('role').notNull(),
		createdAt: createdAt()
	},
	(g) => [primaryKey({ columns: [g.siteId, g.userId] }), index('site_grant_user_idx').on(g.userId)]
);

/** Who changed what, when: every change to a site, scenario or device. */
export const auditEvents = pgTable(
	'audit_event',
	{
		id: uuidId(),
		workspaceId: belongsTo('workspace_id', () => workspaces.id),
		siteId: uuid('site_id').references(() => sites.id, { onDelete: 'cascade' }),
		userId: text('user_id').references(() => users.id, { onDelete: 'set null' }),
		userName: text('user_name'),
		entity: text('entity', { enum: ['site', 'scenario', 'device', 'bill'] }).notNull(),
		entityId: uuid('entity_id').notNull(),
		action: text('action').notNull(),
		summary: text('summary').notNull(),
		changes: jsonb('changes').$type<Record<string, { from: unknown; to: unknown }>>(),
		createdAt: createdAt()
	},
	(a) => [index('audit_site_idx').on(a.siteId, a.createdAt)]
);
