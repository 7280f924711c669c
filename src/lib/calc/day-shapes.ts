import { INTERVAL_HOURS, INTERVAL_MINUTES, SLOTS_PER_DAY, type WallClockDay } from './clock';

/**
 * The 15-minute intervals of one local day as real instants: how many there are (96 on an ordinary
 * day, 92 on a spring-forward day, 100 on a fall-back day) and the wall-clock minute each one starts
 * at. Days with the same shape share profiles, so a year collapses into a handful of distinct days.
 */
export interface DayShape extends WallClockDay {
	key: string;
	/** Index of the first interval of each wall-clock hour (for 60-minute demand). */
	hourStarts: Int16Array;
	hours: number;
}

const shapes = new Map<string, DayShape>();

/** The shape with these wall-clock minutes; equal shapes are one object, so they compare by identity. */
export function shapeOf(minutes: Int16Array): DayShape {
	const standard =
		minutes.length === SLOTS_PER_DAY && minutes.every((minute, i) => minute === i * INTERVAL_MINUTES);
	const key = standard ? 'standard' : minutes.join(',');
	const known = shapes.get(key);
	if (known) return known;
	const hourStarts: number[] = [];
	minutes.forEach((minute, i) => {
		const previous = minutes[i - 1];
		const start = hourStarts[hourStarts.length - 1] ?? 0;
		const newHour =
			previous === undefined ||
			minute % 60 === 0 ||
			Math.floor(minute / 60) !== Math.floor(previous / 60) ||
			i - start >= 4;
		if (newHour) hourStarts.push(i);
	});
	const shape = {
		key,
		standard,
		minutes,
		hourStarts: Int16Array.from(hourStarts),
		hours: minutes.length * INTERVAL_HOURS
	};
	shapes.set(key, shape);
	return shape;
}

export const STANDARD_DAY: DayShape = shapeOf(
	new Int16Array(SLOTS_PER_DAY).map((_, slot) => slot * INTERVAL_MINUTES)
);
