// layerchart's parts as the charts use them, loaded after the page is up (see load.ts).
export { default as Axis } from './Axis.svelte';
export { default as Chart } from './Chart.svelte';
export { default as Circle } from './Circle.svelte';
export { default as Path } from './Path.svelte';
export { default as Rect } from './Rect.svelte';
export { default as Spline } from './Spline.svelte';
export { default as Svg } from './Svg.svelte';
import type * as d3 from 'd3-scale';
import { layerchart } from './load';

export { layerchart, loadLayerchart } from './load';

// d3's scales for the drawings, from the same deferred module (call them only while drawing).
type Call = (...args: unknown[]) => unknown;
export const scaleBand = ((...args: unknown[]) =>
	(layerchart().scaleBand as Call)(...args)) as typeof d3.scaleBand;
export const scaleLinear = ((...args: unknown[]) =>
	(layerchart().scaleLinear as Call)(...args)) as typeof d3.scaleLinear;
