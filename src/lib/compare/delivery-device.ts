import type { DeliveryDevice } from '$lib/calc';

/** The part of a device (stored or being edited) that says what it delivers. */
type Delivering = {
	name: string;
	category?: string;
	quantity?: number;
	inWater?: boolean;
	waterLpm?: number;
	airLpm?: number;
};

const usable = (n: number | undefined) =>
	typeof n === 'number' && Number.isFinite(n) && n >= 0 ? n : undefined;

/**
 * What the core's `scenarioDelivery` reads of a device: its duty, count and what one unit moves. A
 * figure still being typed (empty, not a number) counts as not given; a quantity as one. Browser-safe: the scenario page
 * shows the delivery of the list as edited, the server that of the list as saved.
 */
export function deliveryDevice(device: Delivering): DeliveryDevice {
	const waterLpm = usable(device.waterLpm);
	const airLpm = usable(device.airLpm);
	return {
		name: device.name,
		category: device.category ?? 'other',
		// An empty quantity is the schema's default, one unit.
		quantity: usable(device.quantity) ?? 1,
		...(device.inWater !== undefined ? { inWater: device.inWater } : {}),
		...(waterLpm !== undefined ? { waterLpm } : {}),
		...(airLpm !== undefined ? { airLpm } : {})
	};
}
