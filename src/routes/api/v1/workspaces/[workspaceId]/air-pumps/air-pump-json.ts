// The JSON shape of a workspace's air pump, shared by the list and the single-pump routes.
import type { WorkspaceAirPump } from '$lib/server/workspaces/air-pumps';

/** A pump as the API answers it: its id beside the data sheet's fields (pressures in kPa gauge, air in L/min). */
export const airPumpJson = ({ id, pump }: WorkspaceAirPump) => ({ id, ...pump });
