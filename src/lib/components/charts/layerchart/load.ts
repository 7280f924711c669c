type Parts = typeof import('./parts');

let parts: Parts | undefined;
let loading: Promise<Parts> | undefined;

/**
 * Fetches layerchart once, for every chart on the page. ChartFrame waits for it before it draws, so the
 * stand-ins in this folder find it loaded (they cannot wait: layerchart's context must be read at once).
 */
export function loadLayerchart(): Promise<Parts> {
	loading ??= import('./parts').then((loaded) => (parts = loaded));
	return loading;
}

/** layerchart's parts, once `loadLayerchart()` has finished; drawing before that is a mistake here. */
export function layerchart(): Parts {
	if (!parts) throw new Error('A chart was drawn before layerchart loaded: draw inside ChartFrame');
	return parts;
}
