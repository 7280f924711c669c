import type { Calendar, DayClass } from './calendar';
import type { Equipment } from './equipment.schema';
import { runningKw, standbyKw } from './power';
import { type DayProfile, dayProfile, scheduleKey } from './schedule';

/**
 * Devices with the same schedule and months draw in proportion to one shared profile, so they are
 * summed into a load group: the group's running and standby kW are the sums of its members'. Any
 * device's figures follow from its group's by linearity (its kW over the group's).
 */
export interface LoadGroup {
	/** Index into `Loads.schedules`. */
	schedule: number;
	/** months[m] is 1 when the devices run in month m (1–12). */
	months: Uint8Array;
	runKw: number;
	standbyKw: number;
}

export interface DeviceLoad {
	group: number;
	runKw: number;
	standbyKw: number;
}

export interface Loads {
	schedules: Array<Equipment['schedule']>;
	groups: LoadGroup[];
	devices: DeviceLoad[];
}

const ALL_MONTHS = [1, 2, 3, 4, 5, 6, 7, 8, 9, 10, 11, 12];

/** Groups a request's equipment by schedule shape; `devices` keeps the request's order. */
export function groupLoads(equipment: readonly Equipment[]): Loads {
	const schedules: Loads['schedules'] = [];
	const scheduleIndex = new Map<string, number>();
	const groups: LoadGroup[] = [];
	const groupIndex = new Map<string, number>();
	const devices = equipment.map((device) => {
		const months = device.months ? [...new Set(device.months)].sort((a, b) => a - b) : ALL_MONTHS;
		const schedule = scheduleKey(device.schedule);
		const key = months.length === 12 ? schedule : `${schedule}|${months.join(',')}`;
		let group = groupIndex.get(key);
		if (group === undefined) {
			let index = scheduleIndex.get(schedule);
			if (index === undefined) {
				index = schedules.push(device.schedule) - 1;
				scheduleIndex.set(schedule, index);
			}
			const mask = new Uint8Array(13);
			for (const month of months) mask[month] = 1;
			group = groups.push({ schedule: index, months: mask, runKw: 0, standbyKw: 0 }) - 1;
			groupIndex.set(key, group);
		}
		const load = { group, runKw: runningKw(device), standbyKw: standbyKw(device) };
		const entry = groups[group];
		if (entry) {
			entry.runKw += load.runKw;
			entry.standbyKw += load.standbyKw;
		}
		return load;
	});
	return { schedules, groups, devices };
}

/** Day profiles of the load groups, computed once per schedule and calendar variant (weekend, shape). */
export class ProfileBook {
	private readonly cache: Array<Array<DayProfile | undefined>>;

	constructor(
		private readonly loads: Loads,
		private readonly calendar: Calendar
	) {
		this.cache = loads.schedules.map(() => new Array<DayProfile | undefined>(calendar.variants.length));
	}

	/** The group's profile on a day of the class, or null outside its months (it draws nothing). */
	profile(group: number, day: DayClass): DayProfile | null {
		const load = this.loads.groups[group];
		if (!load || load.months[day.month] !== 1) return null;
		const row = this.cache[load.schedule];
		const schedule = this.loads.schedules[load.schedule];
		if (!row || !schedule) return null;
		let profile = row[day.variant];
		if (!profile) {
			const variant = this.calendar.variants[day.variant];
			if (!variant) return null;
			profile = row[day.variant] = dayProfile(schedule, variant.weekend, variant.shape);
		}
		return profile;
	}
}
