// The parts of layerchart Runrate draws with. Only load.ts imports this module, and only with import(),
// so layerchart (about 110 kB gzipped) arrives after a page is up, never in its first download.
export { Axis, Chart, Circle, getChartContext, Path, Rect, Spline, Svg } from 'layerchart';
