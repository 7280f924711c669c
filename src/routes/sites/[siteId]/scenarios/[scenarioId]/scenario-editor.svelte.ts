import type { CalculateResponse } from '$lib/calc/types';
import type { DeviceSpec } from '$lib/components/equipment/equipment-table';

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
	result = $state<Priced | null>(null);
	resultProblem = $state<string | null>(null);
	issues = $state<Issue[]>([]);
	saveMessage = $state<{ tone: 'ok' | 'error'; text: string } | null>(null);
	saving = $state(false);
	calculating = $state(false);
	elapsedMs = $state<number | null>(null);
	#controller: AbortController | null = null;
	#timer: ReturnType<typeof setTimeout> | null = null;

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

	recalculate(delayMs = 250) {
		if (this.#timer) clearTimeout(this.#timer);
		const devices = this.specs;
		this.#timer = setTimeout(() => void this.#price(devices), delayMs);
	}

	async #price(devices: DeviceSpec[]) {
		this.#controller?.abort();
		const controller = (this.#controller = new AbortController());
		this.calculating = true;
		const started = performance.now();
		try {
			const res = await fetch(`/api/v1/scenarios/${this.scenarioId}/results`, {
				method: 'POST',
				headers: { 'content-type': 'application/json' },
				body: JSON.stringify({ devices }),
				signal: controller.signal
			});
			const body = await res.json();
			if (res.ok) {
				this.result = body;
				this.resultProblem = null;
				this.issues = [];
				this.elapsedMs = Math.round(performance.now() - started);
			} else {
				this.issues = (body.issues ?? []).map((i: Issue) => ({
					...i,
					path: i.path.replace(/^devices\./, '')
				}));
				this.resultProblem = body.issues?.length
					? 'Fix the highlighted fields to see the results.'
					: body.message;
			}
		} catch (error) {
			if ((error as Error).name !== 'AbortError')
				this.resultProblem = 'No answer from the server. Check the connection.';
		} finally {
			if (this.#controller === controller) this.calculating = false;
		}
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
				this.issues = (body.issues ?? []).map((i: Issue) => ({
					...i,
					path: i.path.replace(/^devices\./, '')
				}));
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
