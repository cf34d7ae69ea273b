import { saveFile } from '../../../lib/save-file';
import type { ChartSeries } from './chart-series';

const SVG_NS = 'http://www.w3.org/2000/svg';
const LEGEND_ROW = 18;

/** Styles a chart's SVG takes from the page (CSS variables, theme fonts) that a file on its own would lose. */
const INLINED_STYLES = ['fill', 'stroke', 'stroke-width', 'stroke-dasharray', 'opacity', 'font-family', 'font-size', 'font-weight'] as const;

/**
 * A standalone copy of a chart's SVG: every inherited colour and font written onto its element,
 * a background behind it, and the SVG namespace declared, so it opens the same outside the app.
 */
export function serializeChart(svg: SVGSVGElement, background: string, legend: ChartSeries[] = []): string {
  const copy = svg.cloneNode(true) as SVGSVGElement;
  const sources = [svg, ...svg.querySelectorAll('*')];
  const targets = [copy, ...copy.querySelectorAll('*')];
  sources.forEach((source, index) => {
    const target = targets[index] as SVGElement;
    const computed = window.getComputedStyle(source);
    for (const property of INLINED_STYLES) {
      const value = computed.getPropertyValue(property);
      if (value) target.style.setProperty(property, value);
    }
  });
  const { width, height } = svg.getBoundingClientRect();
  // The first row of the legend fills the band the page's HTML legend leaves empty; more rows go above it.
  const legendHeight = Math.max(0, legendRowsFor(legend, width) - 1) * LEGEND_ROW;
  drawLegend(copy, legend, width, legendHeight);
  copy.setAttribute('xmlns', SVG_NS);
  copy.setAttribute('width', String(Math.round(width)));
  copy.setAttribute('height', String(Math.round(height + legendHeight)));
  copy.setAttribute('viewBox', `0 ${-legendHeight} ${Math.round(width)} ${Math.round(height + legendHeight)}`);
  const backdrop = document.createElementNS(SVG_NS, 'rect');
  backdrop.setAttribute('x', '0');
  backdrop.setAttribute('y', String(-legendHeight));
  backdrop.setAttribute('width', String(Math.round(width)));
  backdrop.setAttribute('height', String(Math.round(height + legendHeight)));
  backdrop.setAttribute('fill', background);
  copy.insertBefore(backdrop, copy.firstChild);
  return new XMLSerializer().serializeToString(copy);
}

interface LegendPlace {
  entry: ChartSeries;
  x: number;
  row: number;
}

/** Where each legend entry goes: left to right, a new row when the next one would not fit. */
function legendPlaces(legend: ChartSeries[], width: number): LegendPlace[] {
  const places: LegendPlace[] = [];
  let x = 8;
  let row = 0;
  for (const entry of legend) {
    const entryWidth = 26 + entry.label.length * 6.2;
    if (x + entryWidth > width && x > 8) {
      x = 8;
      row += 1;
    }
    places.push({ entry, x, row });
    x += entryWidth;
  }
  return places;
}

const legendRowsFor = (legend: ChartSeries[], width: number) => (legend.length === 0 ? 0 : (legendPlaces(legend, width).at(-1)?.row ?? 0) + 1);

/** The page shows the legend as HTML beside the SVG; the file gets it drawn in, from `-above` down. */
function drawLegend(svg: SVGSVGElement, legend: ChartSeries[], width: number, above: number): void {
  const group = document.createElementNS(SVG_NS, 'g');
  for (const { entry, x, row } of legendPlaces(legend, width)) {
    const y = -above + 12 + row * LEGEND_ROW;
    const line = document.createElementNS(SVG_NS, 'line');
    Object.entries({ x1: x, x2: x + 16, y1: y, y2: y, stroke: entry.color, 'stroke-width': 2, 'stroke-dasharray': entry.dashed ? '5 3' : 'none' }).forEach(([k, v]) => line.setAttribute(k, String(v)));
    const text = document.createElementNS(SVG_NS, 'text');
    Object.entries({ x: x + 20, y: y + 4, 'font-size': 11, 'font-family': 'Inter, sans-serif', fill: '#4a5562' }).forEach(([k, v]) => text.setAttribute(k, String(v)));
    text.textContent = entry.label;
    group.append(line, text);
  }
  svg.append(group);
}

/** Draws the SVG text onto a canvas at `scale` times its size and answers the PNG. */
export function rasterizeChart(svgText: string, width: number, height: number, scale = 2): Promise<Blob> {
  return new Promise((resolve, reject) => {
    const url = URL.createObjectURL(new Blob([svgText], { type: 'image/svg+xml;charset=utf-8' }));
    const image = new Image();
    image.onload = () => {
      const canvas = document.createElement('canvas');
      canvas.width = Math.round(width * scale);
      canvas.height = Math.round(height * scale);
      const context = canvas.getContext('2d');
      if (!context) {
        URL.revokeObjectURL(url);
        reject(new Error('This browser cannot draw the chart to an image'));
        return;
      }
      context.scale(scale, scale);
      context.drawImage(image, 0, 0, width, height);
      URL.revokeObjectURL(url);
      canvas.toBlob((blob) => (blob ? resolve(blob) : reject(new Error('The chart could not be turned into a PNG'))), 'image/png');
    };
    image.onerror = () => {
      URL.revokeObjectURL(url);
      reject(new Error('The chart could not be drawn for the PNG'));
    };
    image.src = url;
  });
}

/** Saves the chart drawn inside `container` as an SVG or PNG file, with its legend drawn in. */
export async function downloadChart(container: HTMLElement, baseName: string, format: 'svg' | 'png', legend: ChartSeries[] = []): Promise<void> {
  // The plot's own surface, not the little legend icons (which are recharts-surface SVGs too).
  const svg = container.querySelector<SVGSVGElement>('.recharts-wrapper > svg.recharts-surface');
  if (!svg) throw new Error('There is no chart drawn to download yet');
  const background = window.getComputedStyle(container).backgroundColor || '#ffffff';
  const text = serializeChart(svg, background === 'rgba(0, 0, 0, 0)' ? '#ffffff' : background, legend);
  if (format === 'svg') {
    saveFile(new Blob([text], { type: 'image/svg+xml;charset=utf-8' }), `${baseName}.svg`);
    return;
  }
  const size = new DOMParser().parseFromString(text, 'image/svg+xml').documentElement;
  saveFile(await rasterizeChart(text, Number(size.getAttribute('width')), Number(size.getAttribute('height'))), `${baseName}.png`);
}
