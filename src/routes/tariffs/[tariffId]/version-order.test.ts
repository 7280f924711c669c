import { describe, expect, it } from 'vitest';
import { previousVersion, versionOrder } from './version-order';

const v = (number: number, effectiveFrom: string) => ({ number, effectiveFrom, effectiveTo: null });

describe('the tariff page’s version order', () => {
	const versions = [v(1, '2026-01-01'), v(2, '2026-07-01'), v(3, '2027-01-01')];

	it('puts the version in force today first and a future one apart', () => {
		const order = versionOrder(versions, '2026-12-03');
		expect(order.inForceAndEarlier.map((x) => x.number)).toEqual([2, 1]);
		expect(order.future.map((x) => x.number)).toEqual([3]);
	});

	it('counts a version starting today as in force', () => {
		expect(versionOrder(versions, '2027-01-01').inForceAndEarlier[0]?.number).toBe(3);
	});

	it('compares each version with the one in force before it', () => {
		expect(previousVersion(versions, versions[2]!)?.number).toBe(2);
		expect(previousVersion(versions, versions[0]!)).toBeUndefined();
	});
});
