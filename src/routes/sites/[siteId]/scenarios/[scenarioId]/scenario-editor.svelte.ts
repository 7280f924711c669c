import type { CalculateResponse } from '$lib/calc';
import type { DeviceSpec } from '$lib/components/equipment/equipment-table';
import { LatestRequest, RequestFailed } from '$lib/client/latest-request.svelte';

export type Row = { key: string; spec: DeviceSpec };
type Issue = { path: string; message: string };
type Priced = CalculateResponse & { tariff?: { id: string; name: string; utility: string } };

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
	#pricing = new LatestRequest<DeviceSpec[], Priced>({
		delayMs: 250,
		noAnswer: 'No answer from the server. Check the connection.',
		send: (devices, signal) => this.#price(devices, signal)
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
		return this.#pricing.error;
	}
	/** True while results are on their way. */
	get calculating(): boolean {
		return this.#pricing.pending;
	}

	recalculate(delayMs = 250) {
		this.#pricing.request(this.specs, delayMs);
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
			throw new RequestFailed(
				body.issues?.length ? 'Fix the highlighted fields to see the results.' : (body.message ?? null)
			);
		}
		this.issues = [];
		this.elapsedMs = Math.round(performance.now() - started);
		return body;
	}

	async save() {
		this.saving = true;
		this.saveMessage = null;
		const devices = this.specs;
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

/** The API's field paths start at the request body ("devices.2.watts"); the editor's at the rows. */
function withoutDevicesPrefix(issues: Issue[] | undefined): Issue[] {
	return (issues ?? []).map((i) => ({ ...i, path: i.path.replace(/^devices\./, '') }));
}
