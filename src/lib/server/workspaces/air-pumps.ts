// A workspace's own air pumps, entered from their data sheets; the air and water designer offers them
// beside the typical pump classes. Routes call the guard first (viewers read, editors write); every
// query here is scoped by the workspace, so a pump of another workspace is never found.
import { and, asc, count, eq } from 'drizzle-orm';
import type { AirPump } from '$lib/calc';
import { db } from '../db';
import { airPumps } from '../db/schema';

/** How many pumps one workspace keeps: a library of data sheets, not a catalogue. */
export const MAX_AIR_PUMPS = 100;

/** A stored pump: its id and the core's shape. */
export type WorkspaceAirPump = { id: string; pump: AirPump };

const UUID = /^[0-9a-f]{8}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{12}$/i;

const columns = {
	id: airPumps.id,
	name: airPumps.name,
	points: airPumps.points,
	inputWatts: airPumps.inputWatts,
	wireToAirPercent: airPumps.wireToAirPercent
};

type Row = {
	id: string;
	name: string;
	points: AirPump['points'];
	inputWatts: number | null;
	wireToAirPercent: number;
};

const shaped = ({ id, ...pump }: Row): WorkspaceAirPump => ({ id, pump });

/** The workspace's pumps by name. */
export async function listAirPumps(workspaceId: string): Promise<WorkspaceAirPump[]> {
	const rows = await db
		.select(columns)
		.from(airPumps)
		.where(eq(airPumps.workspaceId, workspaceId))
		.orderBy(asc(airPumps.name), asc(airPumps.createdAt));
	return rows.map(shaped);
}

/** One pump of the workspace, or null (also for an id that is not a UUID, or another workspace's pump). */
export async function findAirPump(workspaceId: string, pumpId: string): Promise<WorkspaceAirPump | null> {
	if (!UUID.test(pumpId)) return null;
	const [row] = await db
		.select(columns)
		.from(airPumps)
		.where(and(eq(airPumps.workspaceId, workspaceId), eq(airPumps.id, pumpId)));
	return row ? shaped(row) : null;
}

/** Stores a validated pump; 'full' when the workspace already keeps MAX_AIR_PUMPS. */
export async function createAirPump(workspaceId: string, pump: AirPump): Promise<{ id: string } | 'full'> {
	return db.transaction(async (tx) => {
		const [kept] = await tx
			.select({ n: count() })
			.from(airPumps)
			.where(eq(airPumps.workspaceId, workspaceId));
		if ((kept?.n ?? 0) >= MAX_AIR_PUMPS) return 'full' as const;
		const [row] = await tx
			.insert(airPumps)
			.values({ workspaceId, ...fields(pump) })
			.returning({ id: airPumps.id });
		return { id: row!.id };
	});
}

/** Replaces a pump's data sheet; false when the workspace has no such pump. */
export async function updateAirPump(workspaceId: string, pumpId: string, pump: AirPump): Promise<boolean> {
	if (!UUID.test(pumpId)) return false;
	const rows = await db
		.update(airPumps)
		.set({ ...fields(pump), updatedAt: new Date() })
		.where(and(eq(airPumps.workspaceId, workspaceId), eq(airPumps.id, pumpId)))
		.returning({ id: airPumps.id });
	return rows.length > 0;
}

/** Deletes a pump; false when the workspace has no such pump. */
export async function deleteAirPump(workspaceId: string, pumpId: string): Promise<boolean> {
	if (!UUID.test(pumpId)) return false;
	const rows = await db
		.delete(airPumps)
		.where(and(eq(airPumps.workspaceId, workspaceId), eq(airPumps.id, pumpId)))
		.returning({ id: airPumps.id });
	return rows.length > 0;
}

/** The columns a pump writes; only the schema's fields, never extra keys a body carried. */
const fields = (pump: AirPump) => ({
	name: pump.name,
	points: pump.points.map(({ pressureKPa, airLpm }) => ({ pressureKPa, airLpm })),
	inputWatts: pump.inputWatts,
	wireToAirPercent: pump.wireToAirPercent
});

/** A pump as the API answers it: its id beside the data sheet's fields (pressures in kPa gauge, air in L/min). */
export const airPumpJson = ({ id, pump }: WorkspaceAirPump) => ({ id, ...pump });
