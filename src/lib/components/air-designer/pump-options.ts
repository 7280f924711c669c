// The air pumps a design may use, as the designer's one list: the pump a saved design holds (when it
// is no longer one of the others as they are now), the workspace's own pumps from their data sheets,
// and the typical classes of the core.
import type { AirDesign, AirPump } from '$lib/calc';

type Source = { kind: 'typical' | 'workspace'; id: string };

/** One choice of the pump list: its value in the select, its words, its table and where it came from. */
export type PumpOption = {
	value: string;
	label: string;
	group: 'saved' | 'workspace' | 'typical';
	pump: AirPump;
	/** Where it comes from, stored with the design; absent for a saved pump whose source is gone. */
	source?: Source;
	/** What a typical class stands for, in words. */
	note?: string;
};

const valueOf = (source: Source) => `${source.kind}:${source.id}`;

/**
 * The options in the order the select shows them. The saved design's pump comes first only when no
 * option holds the same table any more (the workspace changed or deleted it, or the typical values were
 * revised): what was saved is never replaced behind the person's back.
 */
export function pumpOptions(
	typical: readonly { id: string; pump: AirPump; note: string }[],
	workspace: readonly { id: string; pump: AirPump }[],
	saved: AirDesign | null
): PumpOption[] {
	const others: PumpOption[] = [
		...workspace.map(({ id, pump }) => ({
			value: valueOf({ kind: 'workspace', id }),
			label: pump.name,
			group: 'workspace' as const,
			pump,
			source: { kind: 'workspace' as const, id }
		})),
		...typical.map(({ id, pump, note }) => ({
			value: valueOf({ kind: 'typical', id }),
			label: pump.name,
			group: 'typical' as const,
			pump,
			source: { kind: 'typical' as const, id },
			note
		}))
	];
	if (!saved || savedOption(others, saved)) return others;
	return [
		{
			value: 'saved',
			label: `${saved.pump.name} (as saved with this design)`,
			group: 'saved',
			pump: saved.pump,
			...(saved.pumpSource ? { source: saved.pumpSource } : {})
		},
		...others
	];
}

/** JSON with each object's keys sorted: a design read back from jsonb has its keys in another order. */
export function canonical(value: unknown): string {
	if (Array.isArray(value)) return `[${value.map(canonical).join(',')}]`;
	if (value !== null && typeof value === 'object')
		return `{${Object.keys(value)
			.filter((key) => (value as Record<string, unknown>)[key] !== undefined)
			.sort()
			.map((key) => `${JSON.stringify(key)}:${canonical((value as Record<string, unknown>)[key])}`)
			.join(',')}}`;
	return JSON.stringify(value);
}

/** The option that still holds exactly the saved design's pump, if any. */
function savedOption(options: readonly PumpOption[], saved: AirDesign): PumpOption | undefined {
	const table = canonical(saved.pump);
	return options.find(
		(option) =>
			(!saved.pumpSource || option.value === valueOf(saved.pumpSource)) && canonical(option.pump) === table
	);
}

/**
 * The option a designer opens with: the saved design's pump; else the typical class `score` ranks
 * lowest (the watts it draws for the blank design; null: it cannot run it), else the first typical
 * class, else the first option.
 */
export function initialPump(
	options: readonly PumpOption[],
	saved: AirDesign | null,
	score: (pump: AirPump) => number | null = () => null
): string {
	if (saved) return (savedOption(options, saved) ?? options.find((o) => o.group === 'saved'))?.value ?? '';
	const typical = options.filter((o) => o.group === 'typical');
	const scored = typical
		.map((option) => ({ option, watts: score(option.pump) }))
		.filter((s): s is { option: PumpOption; watts: number } => s.watts !== null)
		.sort((a, b) => a.watts - b.watts);
	return (scored[0]?.option ?? typical[0] ?? options[0])?.value ?? '';
}
