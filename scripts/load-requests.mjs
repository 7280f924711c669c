// Shared by load.mjs and profile-request.mjs: the requests they send, so a profile measures the same
// work the load test does. All data is invented.
import { readFileSync } from 'node:fs';

export const people = JSON.parse(readFileSync('data/demo-people.json', 'utf8'));

/** The calculation body: 100 invented devices on an invented two-season time-of-use tariff. */
export function calculation() {
	const kinds = [
		{ type: 'always' },
		{ type: 'hours', hoursPerDay: 12 },
		{ type: 'windows', windows: [{ start: '06:00', end: '22:00' }] },
		{ type: 'cycle', onMinutes: 15, offMinutes: 45 }
	];
	return {
		period: { start: '2027-01', months: 12 },
		timezone: 'America/Chicago',
		holidays: { country: 'US', region: 'WI' },
		tariff: {
			currency: 'USD',
			fixedCharges: [{ label: 'Customer charge (invented)', perMonth: 18 }],
			energyCharges: [
				{
					label: 'Energy',
					type: 'tou',
					seasons: [
						{
							months: [6, 7, 8, 9],
							periods: [
								{
									label: 'On-peak',
									perKwh: 0.29,
									days: 'weekdays',
									windows: [{ start: '14:00', end: '19:00' }]
								}
							],
							otherPerKwh: 0.1
						},
						{
							months: [1, 2, 3, 4, 5, 10, 11, 12],
							periods: [
								{ label: 'Peak', perKwh: 0.21, days: 'all', windows: [{ start: '17:00', end: '20:00' }] }
							],
							otherPerKwh: 0.11
						}
					]
				}
			],
			demandCharges: [{ label: 'Demand', perKw: 6.5, intervalMinutes: 15 }],
			taxes: [{ label: 'Tax', percent: 5 }]
		},
		equipment: Array.from({ length: 100 }, (_, i) => ({
			name: `Load test device ${i + 1}`,
			category: 'water-pump',
			quantity: 1 + (i % 3),
			power: { watts: 40 + ((i * 53) % 1500) },
			schedule: kinds[i % kinds.length]
		}))
	};
}

/** Signs in with a demo person's password through the sign-in form's action; resolves with the session cookie. */
export async function signIn(base, email) {
	const res = await fetch(`${base}/signin?/password`, {
		method: 'POST',
		headers: {
			origin: base,
			'content-type': 'application/x-www-form-urlencoded',
			'x-sveltekit-action': 'true'
		},
		body: new URLSearchParams({ email, password: people.password }),
		redirect: 'manual'
	});
	const cookie = res.headers
		.getSetCookie()
		.map((c) => c.split(';')[0])
		.find((c) => c.includes('session-token'));
	if (!cookie) throw new Error(`sign-in as ${email} failed (${res.status})`);
	return cookie;
}
