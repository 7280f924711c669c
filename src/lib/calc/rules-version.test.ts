import { createHash } from 'node:crypto';
import stringify from 'safe-stable-stringify';
import { describe, expect, it } from 'vitest';
import { calculate } from './calculate';
import { compare } from './compare';
import { compareRequestSchema, type CalculateRequestInput } from './request.schema';
import { device, flatTariff, request, VALID_INPUT } from './requests.fixture';
import { RULES_VERSION } from './rules-version';
import { tieredTouSeason, tou, twoTierDelivery, usdTariff } from './tariffs.fixture';

/*
 * Stored results are kept under the rules version they were priced with. If a rule changes and the
 * version does not, stored figures priced under the old rule would still be served: this fingerprint of
 * fixed requests' results changes with any rule they reach, and asks for the bump.
 */

/** The fingerprint of the fixed requests below for each rules version (record a new one on each bump). */
const FINGERPRINTS: Record<number, string> = {
	1: '431f2135720947cd35232acb128049600560044bb6f589ebf3fe94e7f81644db'
};

const year = (more: Partial<CalculateRequestInput>) =>
	request({ period: { start: '2027-01', months: 12 }, timezone: 'America/Chicago', ...more });

const requests = [
	request(VALID_INPUT),
	year({ tariff: twoTierDelivery(), equipment: [device({ power: { watts: 750 } })] }),
	year({
		holidays: { country: 'US' },
		tariff: usdTariff({
			energyCharges: [
				tou('Energy', tieredTouSeason([1, 2, 3, 4, 5, 6]), tieredTouSeason([7, 8, 9, 10, 11, 12]))
			],
			demandCharges: [{ label: 'Demand', perKw: 6.33 }],
			fixedCharges: [{ label: 'Customer charge', perMonth: 12 }]
		}),
		equipment: [
			device({
				power: { watts: 1200 },
				schedule: { type: 'windows', windows: [{ start: '06:00', end: '18:00' }] }
			}),
			device({ name: 'Demo air pump', quantity: 3, power: { watts: 60 } })
		]
	})
];

const comparison = compareRequestSchema.parse({
	period: { start: '2027-01', months: 12 },
	timezone: 'UTC',
	holidays: null,
	tariff: flatTariff(0.1),
	scenarios: [
		{ name: 'Large pump', equipment: [device({ power: { watts: 1000 }, purchaseCost: 100, lifeYears: 4 })] },
		{
			name: 'Small pump',
			status: 'installed',
			equipment: [device({ power: { watts: 400 }, purchaseCost: 400, maintenancePerYear: 5 })],
			oneOffCosts: [{ label: 'Outdoor circuit', amount: 200 }]
		}
	],
	baseline: 0,
	finance: { horizonYears: 10, discountPercent: 5, escalationPercent: 3 },
	emissionFactorKgPerKwh: 0.4
});

const fingerprint = () =>
	createHash('sha256')
		.update(stringify([...requests.map(calculate), compare(comparison)]) ?? '')
		.digest('hex');

describe('the calculation rules version', () => {
	it('names the rules the results were priced under', () => {
		expect(
			fingerprint(),
			'a calculation rule changed: bump RULES_VERSION and record the new fingerprint'
		).toBe(FINGERPRINTS[RULES_VERSION]);
	});
});
