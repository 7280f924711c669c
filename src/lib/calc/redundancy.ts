import type { Equipment } from './equipment.schema';
import { EQUIPMENT_CATEGORIES } from './equipment.schema';
import { unitWatts } from './power';

type Category = (typeof EQUIPMENT_CATEGORIES)[number];

/** What a group of devices does for the stock or the crop; controls and "other" do no single duty. */
export type Duty = 'water' | 'air' | 'heat' | 'cooling' | 'light' | 'sterilising' | 'ventilation';

export const DUTY_OF: Partial<Record<Category, Duty>> = {
	'water-pump': 'water',
	'air-pump': 'air',
	aerator: 'air',
	heater: 'heat',
	chiller: 'cooling',
	lighting: 'light',
	uv: 'sterilising',
	fan: 'ventilation'
};

export interface DutyRedundancy {
	duty: Duty;
	units: number;
	/** Share of the duty's capacity left when its largest single unit fails, 0–1. */
	leftIfLargestFails: number;
	/** The device (row) whose single unit is the largest. */
	largest: string;
}

/**
 * For each duty, what still runs when any one unit fails: the worst case is the largest unit, so
 * what is left is (all units' watts − the largest unit's) ÷ all units' watts. Capacity is taken as
 * proportional to rated watts, as no flow or air figure is stored per device. Two equal air pumps
 * leave half the air; one pump leaves none (the N+1 rule of thumb, common practice).
 */
export function redundancy(equipment: readonly Equipment[]): DutyRedundancy[] {
	const duties = new Map<Duty, { units: number; watts: number; largest: number; name: string }>();
	for (const device of equipment) {
		const duty = DUTY_OF[device.category];
		const unit = unitWatts(device.power);
		if (!duty || device.quantity === 0) continue;
		const entry = duties.get(duty) ?? { units: 0, watts: 0, largest: -1, name: '' };
		entry.units += device.quantity;
		entry.watts += unit * device.quantity;
		if (unit > entry.largest) Object.assign(entry, { largest: unit, name: device.name });
		duties.set(duty, entry);
	}
	return [...duties].map(([duty, { units, watts, largest, name }]) => ({
		duty,
		units,
		leftIfLargestFails: watts > 0 ? (watts - largest) / watts : 0,
		largest: name
	}));
}
