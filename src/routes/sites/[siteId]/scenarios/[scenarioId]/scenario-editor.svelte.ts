import type { CalculateResponse } from '$lib/calc';
import { type DeviceSpec, allIssues } from '$lib/components/equipment/equipment-table';
import { LatestRequest, RequestFailed } from '$lib/client/latest-request.svelte';
import { yearlyDifference } from './against-saved';

export type Row = { key: string; spec: DeviceSpec };
type Issue = { path: string; message: string };
type Priced = CalculateResponse & {
	tariff?: { id: string; name: string; utility: string };
	/** Months priced on the tariff's first version because it starts later, in words. */
	note?: string | null;
};
/** A list's yearly cost, keyed by the list's JSON, so a figure is only ever set against its own list. */
type YearCost = { json: string; perYear: number };

/**
 * The scenario page's state: the edited rows, live results from the server as they change (debounced,
 * a newer edit cancels the request in flight), and saving with the revision the page loaded, so a stale
 * write is refused with a clear message instead of overwriting someone else's change.
 */
export class ScenarioEditor {
	rows = $state<Row[]>([]);
	revision = $state(0);
	saved = $state('');
	issues = $state<Issue[]>([]);
	saveMessage = $state<{ tone: 'ok' | 'error'; text: string } | null>(null);
	saving = $state(false);
	elapsedMs = $state<number | null>(null);
	/** True while a row has a problem the page already shows at its field: nothing is sent until fixed. */
	held = $state(false);
	#pricing = new LatestRequest<DeviceSpec[], Priced>({
		delayMs: 250,
		noAnswer: 'No answer from the server. Check the connection.',
		send: (devices, signal) => this.#price(devices, signal)
	});
	/** The last list priced, and the saved list's cost once known (from its own pricing or a request). */
	#lastPriced = $state<YearCost | null>(null);
	#savedCost = $state<YearCost | null>(null);
	#savedAsked: string | null = null;
	#savedPricing = new LatestRequest<string, YearCost>({
		delayMs: 0,
		noAnswer: '',
		send: async (json, signal) => {
			try {
				const res = await fetch(`/api/v1/scenarios/${this.scenarioId}/results`, {
					method: 'POST',
					headers: { 'content-type': 'application/json' },
					body: JSON.stringify({ devices: JSON.parse(json) }),
					signal
				});
				if (!res.ok) throw new RequestFailed(null);
				const cost = { json, perYear: (await res.json()).totals.cost as number };
				this.#savedCost = cost;
				return cost;
			} catch (failure) {
				// Asked again with the next priced edit; until then the save bar just shows no difference.
				if (this.#savedAsked === json) this.#savedAsked = null;
				throw failure;
			}
		}
	});

	constructor(
		readonly scenarioId: string,
		initial: DeviceSpec[],
		revision: number
	) {
		this.rows = initial.map((spec) => ({ key: crypto.randomUUID(), spec }));
		this.revision = revision;
		this.saved = JSON.stringify(initial);
	}

	get specs(): DeviceSpec[] {
		return $state.snapshot(this.rows).map((r) => r.spec) as DeviceSpec[];
	}

	get dirty(): boolean {
		return JSON.stringify(this.specs) !== this.saved;
	}

	/** The live results for the rows as they were at the last recalculation. */
	get result(): Priced | null {
		return this.#pricing.value;
	}
	/** Why there are no new results, in words. */
	get resultProblem(): string | null {
		return this.held ? FIX_FIELDS : this.#pricing.error;
	}
	/** True while results are on their way. */
	get calculating(): boolean {
		return !this.held && this.#pricing.pending;
	}

	/**
	 * Prices the rows after a pause; while any row has a problem (shown at its field, as the row checks
	 * itself with the same schema) nothing is sent, so an entry being fixed never costs a refused request.
	 */
	/**
	 * The unsaved list's yearly cost minus the saved list's (negative: it saves), while the list has
	 * changes and both are priced; null when nothing changed or a figure is still on its way.
	 */
	get againstSaved(): number | null {
		const json = JSON.stringify(this.specs);
		if (json === this.saved || this.held || this.#lastPriced?.json !== json) return null;
		const saved = this.#savedCost?.json === this.saved ? this.#savedCost.perYear : null;
		return yearlyDifference(this.#lastPriced.perYear, saved);
	}

	recalculate(delayMs = 250) {
		const specs = this.specs;
		this.held = hasProblems(specs);
		if (this.held) this.#pricing.cancel();
		else this.#pricing.request(specs, delayMs);
	}

	async #price(devices: DeviceSpec[], signal: AbortSignal): Promise<Priced> {
		const started = performance.now();
		const res = await fetch(`/api/v1/scenarios/${this.scenarioId}/results`, {
			method: 'POST',
			headers: { 'content-type': 'application/json' },
			body: JSON.stringify({ devices }),
			signal
		});
		const body = await res.json();
		if (!res.ok) {
			this.issues = withoutDevicesPrefix(body.issues);
			throw new RequestFailed(body.issues?.length ? FIX_FIELDS : (body.message ?? null));
		}
		this.issues = [];
		this.elapsedMs = Math.round(performance.now() - started);
		this.#noteCost({ json: JSON.stringify(devices), perYear: body.totals.cost });
		return body;
	}

	/** Keeps a priced list's cost; once the list differs from the saved one, prices the saved one too. */
	#noteCost(cost: YearCost) {
		this.#lastPriced = cost;
		if (cost.json === this.saved) this.#savedCost = cost;
		else if (this.#savedCost?.json !== this.saved && this.#savedAsked !== this.saved) {
			this.#savedAsked = this.saved;
			this.#savedPricing.request(this.saved);
		}
	}

	async save() {
		const devices = this.specs;
		if (hasProblems(devices)) {
			this.saveMessage = { tone: 'error', text: 'Fix the highlighted fields, then save the list.' };
			return;
		}
		this.saving = true;
		this.saveMessage = null;
		try {
			const res = await fetch(`/api/v1/scenarios/${this.scenarioId}/equipment`, {
				method: 'PUT',
				headers: { 'content-type': 'application/json' },
				body: JSON.stringify({ expectedRevision: this.revision, devices })
			});
			const body = await res.json();
			if (res.ok) {
				this.revision = body.revision;
				this.saved = JSON.stringify(devices);
				if (this.#lastPriced) this.#noteCost(this.#lastPriced);
				this.saveMessage = { tone: 'ok', text: 'Saved.' };
			} else if (res.status === 409) {
				this.saveMessage = {
					tone: 'error',
					text: 'Someone else saved this scenario while you were editing. Your changes are still here and not saved: copy what you need, reload to see theirs, then make your change again.'
				};
			} else {
				this.issues = withoutDevicesPrefix(body.issues);
				this.saveMessage = { tone: 'error', text: body.message ?? 'The list could not be saved.' };
			}
		} catch {
			this.saveMessage = {
				tone: 'error',
				text: 'No answer from the server; nothing was saved. Your changes are still here.'
			};
		} finally {
			this.saving = false;
		}
	}
}

const FIX_FIELDS = 'Fix the highlighted fields to see the results.';

/** Whether any device has a problem its row shows (the checks the API would make of each device). */
function hasProblems(devices: DeviceSpec[]): boolean {
	return allIssues(devices.map((spec, i) => ({ key: String(i), spec }))).length > 0;
}

/** The API's field paths start at the request body ("devices.2.watts"); the editor's at the rows. */
function withoutDevicesPrefix(issues: Issue[] | undefined): Issue[] {
	return (issues ?? []).map((i) => ({ ...i, path: i.path.replace(/^devices\./, '') }));
}
