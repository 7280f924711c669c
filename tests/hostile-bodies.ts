/**
 * JSON bodies built to cost the most validation work per byte, just under the API's 1 MB body limit:
 * lists filled with entries that each carry several problems (an empty `{}` where a time window belongs
 * is two problems in three bytes). Shared by the unit test that times validation and the end-to-end
 * test that sends them to the running server.
 */

export const BODY_LIMIT_BYTES = 1024 * 1024;

/**
 * A large body `make(n)` whose JSON fits in `maxBytes`, n from 1 to `maxN` (a body whose schema caps
 * its lists stops growing before the byte limit). n comes from the size of two small bodies, as the
 * bodies grow about linearly, then shrinks 2 % at a time until the body fits.
 */
export function fillTo(
	maxBytes: number,
	make: (n: number) => unknown,
	maxN = 2 ** 17
): { body: unknown; bytes: number } {
	const size = (body: unknown) => Buffer.byteLength(JSON.stringify(body));
	const small = Math.max(1, Math.min(256, Math.floor(maxN / 2)));
	const base = size(make(small));
	const perN = Math.max(1, (size(make(small * 2)) - base) / small);
	let n = Math.min(maxN, Math.floor(small + (maxBytes - base) / perN));
	for (;;) {
		const body = make(n);
		const bytes = size(body);
		if (bytes <= maxBytes || n <= 1) return { body, bytes };
		n = Math.floor(n * 0.98);
	}
}

const spread = (n: number, parts: number) =>
	Array.from({ length: parts }, (_, i) => Math.floor((n + i) / parts));
const emptyWindows = (n: number) => Array.from({ length: n }, () => ({}));
const offGridWindows = (n: number) => Array.from({ length: n }, () => ({ start: '00:01', end: '00:02' }));

/** A device whose every window is wrong; `windows` 1–24. */
const badDevice = (windows: unknown[]) => ({
	name: 'd',
	power: { watts: 1 },
	schedule: { type: 'windows', windows }
});

/** n devices of up to 24 broken windows each, at most 2000 devices (the list's own limit). */
function devices(n: number, window: (count: number) => unknown[]) {
	const count = Math.min(2000, Math.max(1, Math.ceil(n / 24)));
	return spread(n, count).map((w) => badDevice(window(Math.max(1, Math.min(24, w)))));
}

/** The probe's body: 2000 devices, each with 8 windows off the quarter-hour grid (about 740 kB). */
export function probeCalculateBody(devicesCount = 2000, windowsEach = 8) {
	return {
		period: { start: '2027-01', months: 12 },
		timezone: 'UTC',
		tariff: { currency: 'USD' },
		equipment: Array.from({ length: devicesCount }, (_, i) => ({
			name: `Pump ${i}`,
			category: 'water-pump',
			quantity: 1,
			power: { watts: 100 },
			schedule: { type: 'windows', windows: offGridWindows(windowsEach) }
		}))
	};
}

/** The probe's body grown to `maxBytes` (more windows per device, up to 24). */
export const probeCalculateBodyOf = (maxBytes: number) =>
	fillTo(maxBytes, (n) => probeCalculateBody(2000, n), 24);

const calcFields = { period: { start: '2027-01', months: 12 }, timezone: 'UTC', tariff: { currency: 'USD' } };

/** A tariff of 50 time-of-use charges × 12 seasons × 20 periods, each with `windowsEach` empty windows. */
function touStructure(windowsEach: number) {
	const period = { label: 'p', perKwh: 0.1, windows: emptyWindows(windowsEach) };
	const season = { months: [1], periods: Array(20).fill(period), otherPerKwh: 0.1 };
	return {
		currency: 'USD',
		energyCharges: Array(50).fill({ label: 'e', type: 'tou', seasons: Array(12).fill(season) })
	};
}

/** Worst-case bodies by endpoint, each under `maxBytes`. */
export function hostileBodies(maxBytes = BODY_LIMIT_BYTES - 1024) {
	return {
		'POST /api/v1/calculate (empty windows)': fillTo(
			maxBytes,
			(n) => ({
				...calcFields,
				equipment: devices(n, emptyWindows)
			}),
			48_000
		),
		'POST /api/v1/calculate (probe, off-grid windows)': probeCalculateBodyOf(maxBytes),
		'POST /api/v1/calculate (empty devices, long names)': fillTo(
			maxBytes,
			(n) => ({
				...calcFields,
				equipment: Array(2000).fill({ name: 'x'.repeat(n), schedule: {} })
			}),
			1024
		),
		'POST /api/v1/compare': fillTo(maxBytes, (n) => ({
			...calcFields,
			finance: { horizonYears: 10, discountPercent: 5, escalationPercent: 2 },
			scenarios: spread(n, 20).map((share) => ({
				name: 's',
				equipment: devices(Math.max(1, share), emptyWindows)
			}))
		})),
		'POST /api/v1/pumping': fillTo(maxBytes, (n) => ({
			pump: Object.fromEntries(Array.from({ length: n }, (_, i) => [`k${i}`, {}]))
		})),
		'POST /api/v1/airlift': fillTo(maxBytes, (n) => ({
			waterFlow: {},
			...Object.fromEntries(Array.from({ length: n }, (_, i) => [`k${i}`, {}]))
		})),
		'POST /api/v1/aeration': fillTo(maxBytes, (n) => ({
			demand: Object.fromEntries(Array.from({ length: n }, (_, i) => [`k${i}`, {}]))
		})),
		'POST /api/v1/workspaces/:id/air-pumps': fillTo(
			maxBytes,
			(n) => ({ name: 'x'.repeat(n), points: Array(20).fill({}) }),
			2 ** 20
		),
		'PUT /api/v1/scenarios/:id/equipment': fillTo(
			maxBytes,
			(n) => ({
				expectedRevision: 0,
				devices: devices(n, emptyWindows)
			}),
			48_000
		),
		'POST /api/v1/scenarios/:id/results': fillTo(
			maxBytes,
			(n) => ({ devices: devices(n, emptyWindows) }),
			48_000
		),
		'PUT /api/v1/scenarios/:id/equipment/:position': fillTo(
			maxBytes,
			(n) => ({
				expectedRevision: 0,
				device: { ...badDevice(emptyWindows(24)), notes: 'x'.repeat(n) }
			}),
			2 ** 20
		),
		'PATCH /api/v1/scenarios/:id (unknown keys)': fillTo(maxBytes, (n) => ({
			name: 'Plan',
			...Object.fromEntries(Array.from({ length: n }, (_, i) => [`k${i}`, 0]))
		})),
		'POST /api/v1/tariffs': fillTo(
			maxBytes,
			(n) => ({
				workspaceId: null,
				meta: { holidays: { dates: Array(Math.min(n, 1000)).fill('x') } },
				version: {},
				structure: touStructure(n)
			}),
			24
		),
		'POST /api/v1/sites/:id/bills': fillTo(
			maxBytes,
			(n) => ({
				lineItems: Array(50).fill({}),
				notes: 'x'.repeat(n)
			}),
			2 ** 20
		)
	};
}
