// The words "Add to scenario" answers with: what went into the list, or why nothing was saved.
import type { PumpSelection } from '$lib/calc';
import { wattsText } from './air-units';

/** "Added to the equipment list: 2 × Linear pump, 45 W each, always on (saved)." */
export const savedWords = (pump: PumpSelection) =>
	`Added to the equipment list: ${pump.count} × ${pump.pumpName}, ${wattsText(pump.wattsEach)} each, always on. The design is saved with the scenario.`;

/**
 * A refusal's messages, each once: the page-wide one first, then the design's own (keyed
 * `design.<field>`), which the designer's boxes already flag when the browser's check agrees.
 */
export function refusalWords(data: unknown): string[] {
	const errors = (data as { errors?: Record<string, unknown> } | undefined)?.errors ?? {};
	const lines = Object.entries(errors)
		.sort(([a], [b]) => (a === 'form' ? -1 : b === 'form' ? 1 : 0))
		.map(([, message]) => String(message));
	const distinct = [...new Set(lines)];
	return distinct.length ? distinct : ['The design could not be saved. Try again.'];
}
