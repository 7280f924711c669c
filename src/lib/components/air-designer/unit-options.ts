// The unit choices of the designer's boxes, in the words the pumping helper uses for the same units.
import type { FlowUnit } from '$lib/calc';
import type { DepthUnit, RiserUnit } from './design-draft';

type Option<U extends string> = { value: U; label: string };

export const FLOW_OPTIONS: Option<FlowUnit>[] = [
	{ value: 'lpm', label: 'L/min' },
	{ value: 'gph', label: 'US gal/h' },
	{ value: 'gpm', label: 'US gal/min' },
	{ value: 'm3h', label: 'm³/h' }
];

export const DEPTH_OPTIONS: Option<DepthUnit>[] = [
	{ value: 'm', label: 'm' },
	{ value: 'cm', label: 'cm' },
	{ value: 'ft', label: 'ft' },
	{ value: 'in', label: 'in' }
];

export const RISER_OPTIONS: Option<RiserUnit>[] = [
	{ value: 'mm', label: 'mm' },
	{ value: 'in', label: 'in' }
];
