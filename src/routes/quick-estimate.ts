/** One line of the public quick estimate, as the person types it. */
export type QuickDevice = {
	name: string;
	quantity: number;
	powerMode: 'watts' | 'amps';
	watts: number;
	amps: number;
	volts: number;
	runMode: 'always' | 'hours';
	hoursPerDay: number;
};

export const newDevice = (): QuickDevice => ({
	name: 'Water pump',
	quantity: 1,
	powerMode: 'amps',
	watts: 120,
	amps: 1,
	volts: 120,
	runMode: 'always',
	hoursPerDay: 24
});

/** The next calendar month, as "YYYY-MM", in the browser's own time zone. */
export function nextMonth(now = new Date()): string {
	const d = new Date(now.getFullYear(), now.getMonth() + 1, 1);
	return `${d.getFullYear()}-${String(d.getMonth() + 1).padStart(2, '0')}`;
}

/** The calculation request the public estimate sends: one month, a flat rate and an optional monthly charge. */
export function toRequest(
	devices: QuickDevice[],
	perKwh: number,
	perMonth: number,
	month: string,
	timezone: string
) {
	return {
		period: { start: month, months: 1 },
		timezone,
		holidays: null,
		tariff: {
			currency: 'USD',
			fixedCharges: perMonth > 0 ? [{ label: 'Customer charge', perMonth }] : [],
			energyCharges: [{ label: 'Energy', type: 'flat', perKwh }]
		},
		equipment: devices.map((d) => ({
			name: d.name || 'Device',
			category: 'other',
			quantity: d.quantity,
			power:
				d.powerMode === 'watts'
					? { watts: d.watts }
					: { amps: d.amps, volts: d.volts, powerFactor: 1, phases: 1 },
			schedule:
				d.runMode === 'always'
					? { type: 'always' }
					: { type: 'hours', hoursPerDay: d.hoursPerDay, days: 'all' }
		}))
	};
}

export type Issue = { path: string; message: string };
