// A vega-lite specification to an SVG string, without a browser or a canvas, ready for the PDF
// renderer (pdfmake draws SVG strings with the fonts registered there). Deterministic: the same
// specification gives the same bytes (fixed font, fixed locale, definition ids reset per chart).
import * as vega from 'vega';
import { compile, type TopLevelSpec } from 'vega-lite';
import { SVG_FONT } from '../figures/svg.ts';
import { CHART_LOCALE } from './chart-locale.ts';
import { measureText, type TextStyle } from './text-measure.ts';

export interface ChartSize {
  /** Width and height of the plotting area in points (1 SVG px prints as 1 pt). */
  readonly width: number;
  readonly height: number;
}

/** Looks shared by every chart: our embedded font, small type, light grid. */
const BASE_CONFIG = {
  font: SVG_FONT,
  background: 'white',
  view: { stroke: '#9aa0a6' },
  axis: { labelFontSize: 8, titleFontSize: 8.5, titleFontWeight: 'normal', gridColor: '#d5d9dd', domainColor: '#5c6166', tickColor: '#5c6166', labelColor: '#1a1a1a', titleColor: '#1a1a1a' },
  legend: { labelFontSize: 8, titleFontSize: 8.5, titleFontWeight: 'normal' },
  title: { fontSize: 9.5, fontWeight: 'bold', anchor: 'start' },
  text: { fontSize: 8 },
} as const;

interface VegaRuntime {
  textMetrics: { width: (item: TextStyle, text: unknown) => number };
  resetSVGDefIds?: () => void;
}

/** vega-lite and vega report through a logger; a chart must not print on the terminal. */
const SILENT_LOGGER = { level: () => SILENT_LOGGER, error: () => SILENT_LOGGER, warn: () => SILENT_LOGGER, info: () => SILENT_LOGGER, debug: () => SILENT_LOGGER };

let measuring = false;
/** vega measures text through a replaceable function (missing from its typings): ours, once. */
function useOurTextMetrics(): void {
  if (measuring) return;
  const runtime = vega as unknown as VegaRuntime;
  runtime.textMetrics.width = (item, text) => measureText(item, text == null ? '' : String(text).trim());
  measuring = true;
}

/** Merges our base look under the specification's own config (the specification wins). */
function withConfig(spec: TopLevelSpec, size: ChartSize): TopLevelSpec {
  const own = (spec as { config?: Record<string, unknown> }).config ?? {};
  const config: Record<string, unknown> = { ...BASE_CONFIG };
  for (const [k, v] of Object.entries(own)) {
    const base = config[k];
    config[k] = base && typeof base === 'object' && v && typeof v === 'object' ? { ...base, ...v } : v;
  }
  return { ...spec, width: size.width, height: size.height, config } as TopLevelSpec;
}

/** Renders a vega-lite specification (data inline) to an SVG document string. */
export async function renderChartSvg(spec: TopLevelSpec, size: ChartSize): Promise<string> {
  useOurTextMetrics();
  const compiled = compile(withConfig(spec, size), { logger: SILENT_LOGGER as never }).spec;
  const view = new vega.View(vega.parse(compiled), { renderer: 'none', locale: CHART_LOCALE, logLevel: vega.None } as unknown as ConstructorParameters<typeof vega.View>[1]);
  try {
    (vega as unknown as VegaRuntime).resetSVGDefIds?.();
    const svg = await view.toSVG();
    return svg.replace(/^<\?xml[^>]*>\s*/, '');
  } finally {
    view.finalize();
  }
}
