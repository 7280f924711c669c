import type { Delivery } from '$lib/calc';
import { oxygenEnough, oxygenText, targetDo } from './delivery-figures';
import { figure } from './numbers';

/** A compared scenario's name and what it delivers. */
export interface Delivered {
	name: string;
	delivery: Delivery;
}

const quoted = (name: string) => `“${name}”`;

/** "“A”", "“A” and “B”", "“A”, “B” and “C”". */
function names(list: readonly Delivered[]): string {
	const q = list.map((d) => quoted(d.name));
	return q.length < 2 ? (q[0] ?? '') : `${q.slice(0, -1).join(', ')} and ${q.at(-1)}`;
}

/** "Both" for two scenarios, "All three" / "All 4" for more. */
function every(count: number): string {
	if (count === 2) return 'both';
	return `all ${count <= 9 ? ['', '', '', 'three', 'four', 'five', 'six', 'seven', 'eight', 'nine'][count] : count}`;
}

const none = (count: number) => (count === 2 ? 'neither' : 'none of them');

const mgL = (list: readonly Delivered[]) => {
	const targets = new Set(list.map((d) => targetDo(d.delivery)));
	return targets.size === 1 ? `${figure([...targets][0]!, 1)} mg/L` : 'their target dissolved oxygen';
};

/**
 * The oxygen in words: enough means the oxygen supplied covers the stock's demand at the target
 * dissolved oxygen, so the water is held at or above that target.
 */
function oxygenPart(list: readonly Delivered[]): string {
	const enough = list.filter((d) => oxygenEnough(d.delivery) === true);
	const short = list.filter((d) => oxygenEnough(d.delivery) === false);
	const unknown = list.filter((d) => oxygenEnough(d.delivery) === null);
	if (unknown.length === list.length)
		return `${none(list.length)} says yet how much oxygen it supplies against the stock’s demand`;
	if (enough.length === list.length) return `${every(list.length)} keep the fish above ${mgL(list)}`;
	const parts: string[] = [];
	if (enough.length)
		parts.push(`${names(enough)} ${enough.length === 1 ? 'keeps' : 'keep'} the fish above ${mgL(enough)}`);
	for (const d of short)
		parts.push(
			`${quoted(d.name)} falls short: ${oxygenText(d.delivery.oxygenSuppliedGramsPerHour ?? 0)} supplied against ${oxygenText(
				d.delivery.oxygenDemandGramsPerHour ?? 0
			)} needed at ${figure(targetDo(d.delivery), 1)} mg/L`
		);
	if (unknown.length) parts.push(`for ${names(unknown)} the oxygen against the demand is not known`);
	return parts.join('; ');
}

/** Mains power in the water in words: who has none when some do, else all or none. */
function mainsPart(list: readonly Delivered[]): string {
	const dry = list.filter((d) => d.delivery.mainsDevicesInWater === 0);
	const wet = list.filter((d) => d.delivery.mainsDevicesInWater > 0);
	if (wet.length === 0) return `${none(list.length)} has mains power in the water`;
	if (dry.length === 0) return `${every(list.length)} have mains power in the water`;
	return `${names(dry)} ${dry.length === 1 ? 'has' : 'have'} no mains power in the water`;
}

/**
 * One sentence on what the compared scenarios deliver, built from the figures (never from the
 * names): "Both keep the fish above 5 mg/L; “Small pump with air-lifts” has no mains power in the
 * water." Empty for fewer than two scenarios.
 */
export function deliverySentence(list: readonly Delivered[]): string {
	if (list.length < 2) return '';
	const text = `${oxygenPart(list)}; ${mainsPart(list)}.`;
	return text.charAt(0).toUpperCase() + text.slice(1);
}
