import { afterEach, beforeEach, describe, expect, it, vi } from 'vitest';
import { blankDevice } from '$lib/components/equipment/equipment-table';
import { ScenarioEditor } from './scenario-editor.svelte';

// A stand-in for the results endpoint: a list's yearly cost is $1 per watt of its devices (invented),
// so the figures are easy to follow. It records every request the editor sends.
function fakeResults() {
	const sent: { url: string; watts: number[] }[] = [];
	const fetch = vi.fn(async (url: string, init: RequestInit) => {
		const devices = JSON.parse(String(init.body)).devices as { power: { watts: number } }[];
		const watts = devices.map((d) => d.power.watts);
		sent.push({ url, watts });
		const cost = watts.reduce((sum, w) => sum + w, 0);
		return new Response(
			JSON.stringify({ currency: 'USD', periods: [], totals: { kwh: 0, cost, peakKw: 0 } })
		);
	});
	return { sent, fetch };
}

const settle = async () => {
	await vi.runAllTimersAsync();
};

describe('the scenario editor', () => {
	let server: ReturnType<typeof fakeResults>;
	beforeEach(() => {
		vi.useFakeTimers();
		server = fakeResults();
		vi.stubGlobal('fetch', server.fetch);
	});
	afterEach(() => {
		vi.unstubAllGlobals();
		vi.useRealTimers();
	});

	const pump = (watts: number) => ({ ...blankDevice(), name: `Pump ${watts}`, power: { watts } });

	it('sends no request while a row has a problem, says why, and prices the list once it is fixed', async () => {
		const editor = new ScenarioEditor('s1', [pump(1500)], 1);
		editor.recalculate();
		await settle();
		expect(server.sent).toHaveLength(1);

		editor.rows[0]!.spec.power = { watts: -5 };
		editor.recalculate();
		await settle();
		expect(server.sent).toHaveLength(1);
		expect(editor.resultProblem).toBe('Fix the highlighted fields to see the results.');
		expect(editor.calculating).toBe(false);

		editor.rows[0]!.spec.power = { watts: 90 };
		editor.recalculate();
		await settle();
		expect(server.sent.at(-1)?.watts).toEqual([90]);
		expect(editor.resultProblem).toBeNull();
	});

	it('does not send a list with a problem to be saved', async () => {
		const editor = new ScenarioEditor('s1', [pump(100)], 1);
		editor.rows[0]!.spec.quantity = 0.5;
		await editor.save();
		expect(server.sent).toHaveLength(0);
		expect(editor.saveMessage?.tone).toBe('error');
	});

	it('gives the unsaved list’s yearly cost against the saved one, and nothing when unchanged', async () => {
		const editor = new ScenarioEditor('s1', [pump(1500)], 1);
		editor.recalculate();
		await settle();
		expect(editor.againstSaved).toBeNull();

		editor.rows[0]!.spec.power = { watts: 90 };
		editor.recalculate();
		await settle();
		// The saved list was priced on load ($1,500 a year); the edit costs $90: $1,410 less.
		expect(editor.againstSaved).toBe(-1410);
		// One request for the saved list, one for each edit: the saved cost was kept, not asked again.
		expect(server.sent.map((s) => s.watts)).toEqual([[1500], [90]]);

		editor.rows[0]!.spec.power = { watts: 1500 };
		editor.recalculate();
		await settle();
		expect(editor.againstSaved).toBeNull();
	});

	it('prices the saved list itself when the first result it saw was already edited', async () => {
		const editor = new ScenarioEditor('s1', [pump(1500)], 1);
		editor.rows.push({ key: 'k2', spec: pump(60) });
		editor.recalculate();
		await settle();
		expect(server.sent.map((s) => s.watts)).toEqual([[1500, 60], [1500]]);
		expect(editor.againstSaved).toBe(60);
	});
});
