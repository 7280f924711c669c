/**
 * Where a refusal of compare()'s request points, in words a person can act on, never the request's
 * dotted path: "scenarios.1.equipment.2.power.watts" → "“Pond B”, device 3 “Aerator”". The request is
 * built from stored scenarios, so the place names what the person can open and correct.
 */
export function comparisonPlace(
	path: string,
	scenarios: readonly { name: string; devices: readonly { name?: string }[] }[]
): string {
	const [part, index, child, deviceIndex] = path.split('.');
	if (part === 'scenarios' && index !== undefined && /^\d+$/.test(index)) {
		const scenario = scenarios[Number(index)];
		if (!scenario) return 'A scenario';
		const named = `“${scenario.name}”`;
		if (child === 'equipment' && deviceIndex !== undefined && /^\d+$/.test(deviceIndex)) {
			const device = scenario.devices[Number(deviceIndex)];
			const number = Number(deviceIndex) + 1;
			return device?.name ? `${named}, device ${number} “${device.name}”` : `${named}, device ${number}`;
		}
		if (child === 'tariff') return `${named}, its tariff`;
		return named;
	}
	if (part === 'tariff') return 'The baseline’s tariff';
	if (part === 'timezone') return 'The baseline site’s time zone';
	if (part === 'holidays') return 'The baseline’s public holidays';
	return 'The comparison';
}
