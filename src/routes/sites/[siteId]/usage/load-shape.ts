/**
 * Drawing a daily load shape: the mean kWh of each local hour, weekdays and weekends apart. Browser-safe;
 * the figures come from the usage service.
 */

/** Hours 0–23; null where no reading fell in that hour. */
export type LoadShape = { weekday: (number | null)[]; weekend: (number | null)[] };
export type DayKind = keyof LoadShape;

export const DAY_KINDS: readonly DayKind[] = ['weekday', 'weekend'];
export const DAY_KIND_NAMES: Record<DayKind, string> = { weekday: 'Weekdays', weekend: 'Weekends' };

/** The highest hourly figure of either line, for the axis; 0 when there is none. */
export const shapePeak = (shape: LoadShape) =>
	Math.max(0, ...[...shape.weekday, ...shape.weekend].filter((kwh): kwh is number => kwh !== null));

const round = (pixels: number) => Math.round(pixels * 100) / 100;

/**
 * One line as steps — an hour's mean holds across the hour, so the line is flat from h to h+1 — broken
 * where an hour has no readings. `x` and `y` map hours and kWh to pixels (the chart's scales).
 */
export function stepLinePath(
	kwhByHour: (number | null)[],
	x: (hour: number) => number,
	y: (kwh: number) => number
): string {
	const at = (hour: number, kwh: number) => `${round(x(hour))},${round(y(kwh))}`;
	let path = '';
	let drawing = false;
	kwhByHour.forEach((kwh, hour) => {
		if (kwh === null) {
			drawing = false;
			return;
		}
		path += `${drawing ? 'L' : 'M'}${at(hour, kwh)}L${at(hour + 1, kwh)}`;
		drawing = true;
	});
	return path;
}
