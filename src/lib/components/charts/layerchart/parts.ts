// The parts of layerchart (and its d3 scales) Runrate draws with. Only load.ts imports this module, and
// only with import(), so they (about 130 kB gzipped) arrive after a page is up, never in its first download.
export { scaleBand, scaleLinear } from 'd3-scale';
export { Axis, Chart, Circle, getChartContext, Path, Rect, Spline, Svg } from 'layerchart';
