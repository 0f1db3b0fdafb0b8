import { rasterAsImages } from './rasterArrows.ts';

const SVG_NS = 'http://www.w3.org/2000/svg';

/** Splits `text` into lines of at most `maxChars` characters at spaces. */
export function wrapText(text: string, maxChars: number): string[] {
  const lines: string[] = [];
  let line = '';
  for (const word of text.split(/\s+/).filter(Boolean)) {
    if (line && line.length + 1 + word.length > maxChars) {
      lines.push(line);
      line = word;
    } else line = line ? `${line} ${word}` : word;
  }
  if (line) lines.push(line);
  return lines;
}

/**
 * A copy of a chart's SVG that stands on its own as a file: white background, the figure's
 * title above and its caption below as SVG text (so a downloaded figure keeps its caveats),
 * the SVG namespace declared, the hover tip and keyboard focus ring removed, and canvas layers
 * (rasterArrows.ts) turned into images.
 */
export function standaloneSvg(chart: Element): SVGSVGElement {
  const doc = chart.ownerDocument;
  const svg = chart.tagName.toLowerCase() === 'svg' ? chart : chart.querySelector('svg');
  if (!svg) throw new Error('the chart has no <svg> to export');
  const copy = svg.cloneNode(true) as SVGSVGElement;
  for (const g of [...copy.querySelectorAll('g[aria-label="tip"], .census-focus')]) g.remove();
  rasterAsImages(svg, copy);
  const width = Number(svg.getAttribute('width') ?? 640);
  const height = Number(svg.getAttribute('height') ?? 400);
  const figure = chart.tagName.toLowerCase() === 'figure' ? chart : null;
  const title = figure?.querySelector('h2')?.textContent?.trim() ?? '';
  const caption = figure?.querySelector('figcaption')?.textContent?.trim() ?? '';
  const charsPerLine = Math.floor((width - 16) / 6);
  const titleLines = title ? wrapText(title, Math.floor(charsPerLine * 0.8)) : [];
  const captionLines = caption ? wrapText(caption, charsPerLine) : [];
  const top = titleLines.length ? titleLines.length * 18 + 6 : 0;
  const bottom = captionLines.length ? captionLines.length * 14 + 10 : 0;
  const total = height + top + bottom;
  copy.setAttribute('xmlns', SVG_NS);
  copy.setAttribute('width', String(width));
  copy.setAttribute('height', String(total));
  copy.setAttribute('viewBox', `0 ${-top} ${width} ${total}`);
  const bg = doc.createElementNS(SVG_NS, 'rect');
  bg.setAttribute('x', '0');
  bg.setAttribute('y', String(-top));
  bg.setAttribute('width', String(width));
  bg.setAttribute('height', String(total));
  bg.setAttribute('fill', 'white');
  copy.insertBefore(bg, copy.firstChild);
  const addLines = (lines: string[], y0: number, size: number, weight: string) => {
    lines.forEach((line, i) => {
      const t = doc.createElementNS(SVG_NS, 'text');
      t.setAttribute('x', '8');
      t.setAttribute('y', String(y0 + i * (size + 3)));
      t.setAttribute('font-size', String(size));
      t.setAttribute('font-weight', weight);
      t.setAttribute('text-anchor', 'start');
      t.setAttribute('fill', '#20262c');
      t.textContent = line;
      copy.appendChild(t);
    });
  };
  addLines(titleLines, -top + 16, 15, '600');
  addLines(captionLines, height + 14, 11, '400');
  return copy;
}
