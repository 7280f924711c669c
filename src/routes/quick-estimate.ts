/**
 * One line of the public quick estimate, as the person types it. A number box left empty (or holding
 * something that is not a number) reads null: it is sent as it is and refused with the field's message.
 */
export type QuickDevice = {
	name: string;
	quantity: number | null;
	powerMode: 'watts' | 'amps';
	watts: number | null;
	amps: number | null;
	volts: number | null;
	runMode: 'always' | 'hours';
	hoursPerDay: number | null;
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

/** A library tariff as the public estimate uses it: the version in force, with the tariff's own clock. */
export type LibraryRate = {
	name: string;
	structure: unknown;
	timezone: string;
	holidays: unknown;
	versionNumber: number;
};
export type Rate =
	{ kind: 'flat'; perKwh: number | null; perMonth: number | null } | ({ kind: 'library' } & LibraryRate);

type ExportedVersion = {
	meta: { name: string; utility: string; timezone: string; holidays: unknown };
	version: { number: number; effectiveFrom: string; effectiveTo: string | null };
	structure: unknown;
};

/** The version in force on the month's first day (latest effective-from on or before it), as the library rules say. */
export function libraryRate(versions: ExportedVersion[], month: string): LibraryRate | null {
	const day = `${month}-01`;
	const inForce = versions
		.filter((v) => v.version.effectiveFrom <= day && (!v.version.effectiveTo || v.version.effectiveTo >= day))
		.sort(
			(a, b) =>
				a.version.effectiveFrom.localeCompare(b.version.effectiveFrom) || a.version.number - b.version.number
		)
		.at(-1);
	if (!inForce) return null;
	return {
		name: `${inForce.meta.name} (${inForce.meta.utility})`,
		structure: inForce.structure,
		timezone: inForce.meta.timezone,
		holidays: inForce.meta.holidays,
		versionNumber: inForce.version.number
	};
}

/** The calculation request the public estimate sends: one month, on a flat rate or a library tariff. */
export function toRequest(devices: QuickDevice[], rate: Rate, month: string, timezone: string) {
	return {
		period: { start: month, months: 1 },
		timezone: rate.kind === 'library' ? rate.timezone : timezone,
		holidays: rate.kind === 'library' ? rate.holidays : null,
		tariff:
			rate.kind === 'library'
				? rate.structure
				: {
						currency: 'USD',
						fixedCharges: rate.perMonth !== 0 ? [{ label: 'Customer charge', perMonth: rate.perMonth }] : [],
						energyCharges: [{ label: 'Energy', type: 'flat', perKwh: rate.perKwh }]
					},
		equipment: toEquipment(devices)
	};
}

/** The devices as the core's equipment (each unit's power and when it runs); a site keeps them as they are. */
export function toEquipment(devices: QuickDevice[]) {
	return devices.map((d) => ({
		name: d.name || 'Device',
		category: 'other' as const,
		quantity: d.quantity,
		power:
			d.powerMode === 'watts'
				? { watts: d.watts }
				: { amps: d.amps, volts: d.volts, powerFactor: 1, phases: 1 },
		schedule:
			d.runMode === 'always'
				? { type: 'always' as const }
				: { type: 'hours' as const, hoursPerDay: d.hoursPerDay, days: 'all' as const }
	}));
}

/** The power of one unit in watts, as the person gave it; null while a box is empty. */
export function unitWattsOf(d: QuickDevice): number | null {
	if (d.powerMode === 'watts') return d.watts;
	return d.amps === null || d.volts === null ? null : d.amps * d.volts;
}

/**
 * A time zone in words a grower reads, with its IANA name for the record: "Central European Time
 * (Europe/Berlin)", "Coordinated Universal Time (UTC)". Falls back to the bare name where the browser
 * has no words for it.
 */
export function zoneWords(zone: string, at = new Date()): string {
	const named = (style: 'longGeneric' | 'long') => {
		try {
			return new Intl.DateTimeFormat('en-US', { timeZone: zone, timeZoneName: style })
				.formatToParts(at)
				.find((part) => part.type === 'timeZoneName')?.value;
		} catch {
			return undefined;
		}
	};
	// A zone without a generic name ("UTC") gets "GMT+00:00" from longGeneric; its long name reads better.
	const generic = named('longGeneric');
	const words = generic && !generic.startsWith('GMT') ? generic : (named('long') ?? generic);
	const name = zone.replaceAll('_', ' ');
	return words && words !== zone ? `${words} (${name})` : name;
}

/** "January 2027" for "2027-01". */
export const monthName = (month: string) =>
	new Date(`${month}-01T12:00:00Z`).toLocaleDateString('en-US', {
		month: 'long',
		year: 'numeric',
		timeZone: 'UTC'
	});
