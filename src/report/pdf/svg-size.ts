// pdfmake sizes an SVG by parsing it and writing it back out, and the writer indents every
// child node: "F<tspan>x</tspan>" comes out as "F", newline, "<tspan>x</tspan>", which prints
// "F x". We replace that step with one that rewrites only the root element's size, leaving
// the drawing exactly as the figure builder wrote it. pdfmake also parses the whole document
// into a tree only to read the root's width, height and viewBox (about 0.1 s and 20 MB for the
// largest package's charts); we read them from the root tag, with the same fallbacks.
import { createRequire } from 'node:module';

const require = createRequire(import.meta.url);

interface SvgMeasureClass {
  prototype: {
    measureSVG(svg: unknown): { width: number | undefined; height: number | undefined };
    writeDimensions(svg: unknown, dimensions: { width: number; height: number }): unknown;
  };
}

const ROOT_TAG = /<svg\b[^>]*>/;

function attribute(tag: string, name: string): string | undefined {
  const m = new RegExp(`\\s${name}\\s*=\\s*("([^"]*)"|'([^']*)')`).exec(tag);
  return m ? (m[2] ?? m[3]) : undefined;
}

function withoutAttribute(tag: string, name: string): string {
  return tag.replace(new RegExp(`\\s${name}\\s*=\\s*("[^"]*"|'[^']*')`), '');
}

/** Sets width and height on the root <svg> element, adding a viewBox from the old size if it has none. */
export function setRootSize(svg: string, width: number, height: number): string {
  const m = ROOT_TAG.exec(svg);
  if (!m) throw new Error('figure is not an SVG document (no <svg> element)');
  let tag = m[0];
  if (attribute(tag, 'viewBox') === undefined) {
    const w = parseFloat(attribute(tag, 'width') ?? '');
    const h = parseFloat(attribute(tag, 'height') ?? '');
    if (!Number.isFinite(w) || !Number.isFinite(h)) throw new Error('figure SVG needs a viewBox or a numeric width and height');
    tag = tag.replace(/^<svg\b/, `<svg viewBox="0 0 ${w} ${h}"`);
  }
  tag = withoutAttribute(withoutAttribute(tag, 'width'), 'height');
  const selfClosing = tag.endsWith('/>');
  tag = `${tag.slice(0, selfClosing ? -2 : -1).trimEnd()} width="${width}" height="${height}"${selfClosing ? '/>' : '>'}`;
  return svg.slice(0, m.index) + tag + svg.slice(m.index + m[0].length);
}

/** A length attribute as pdfmake reads it: the leading number, units ignored; undefined if none. */
function lengthOf(value: string | undefined): number | undefined {
  const n = parseFloat(value ?? '');
  return Number.isNaN(n) ? undefined : n;
}

/** The size pdfmake's measureSVG gives an SVG string: the root's width and height, each missing
 * one taken from the viewBox. */
export function rootSize(svg: string): { width: number | undefined; height: number | undefined } {
  const m = ROOT_TAG.exec(svg);
  if (!m) throw new Error('figure is not an SVG document (no <svg> element)');
  let width = lengthOf(attribute(m[0], 'width'));
  let height = lengthOf(attribute(m[0], 'height'));
  const viewBox = attribute(m[0], 'viewBox');
  if ((width === undefined || height === undefined) && viewBox !== undefined) {
    const parts = viewBox.trim().split(/[,\s]+/);
    if (parts.length !== 4) throw new Error(`figure SVG viewBox should have 4 numbers, found '${viewBox}'`);
    width ??= lengthOf(parts[2]);
    height ??= lengthOf(parts[3]);
  }
  return { width, height };
}

let patched = false;

/** Installs rootSize and setRootSize in place of pdfmake's measureSVG and writeDimensions for
 * SVG strings (once). */
export function sizeSvgByRootTag(): void {
  if (patched) return;
  const SVGMeasure = (require('pdfmake/js/SVGMeasure.js') as { default: SvgMeasureClass }).default;
  const { measureSVG, writeDimensions } = SVGMeasure.prototype;
  SVGMeasure.prototype.measureSVG = function (svg) {
    if (typeof svg === 'string') return rootSize(svg);
    return measureSVG.call(this, svg);
  };
  SVGMeasure.prototype.writeDimensions = function (svg, dimensions) {
    if (typeof svg === 'string') return setRootSize(svg, dimensions.width, dimensions.height);
    return writeDimensions.call(this, svg, dimensions);
  };
  patched = true;
}
