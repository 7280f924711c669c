// layerchart's parts as the charts use them, loaded after the page is up (see load.ts).
export { default as Axis } from './Axis.svelte';
export { default as Chart } from './Chart.svelte';
export { default as Circle } from './Circle.svelte';
export { default as Path } from './Path.svelte';
export { default as Rect } from './Rect.svelte';
export { default as Spline } from './Spline.svelte';
export { default as Svg } from './Svg.svelte';
export { layerchart, loadLayerchart } from './load';
