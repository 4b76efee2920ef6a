// Charts from vega-lite specifications, drawn as SVG for the PDF: see render-chart.ts.
export { renderChartSvg, type ChartSize } from './render-chart.ts';
export { measureText, type TextStyle } from './text-measure.ts';
export { CHART_LOCALE } from './chart-locale.ts';
