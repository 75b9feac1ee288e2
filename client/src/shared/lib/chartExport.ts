import { downloadBlob, fileSlug } from './download';

/*
 * Exporting an on-screen <svg> chart as a stand-alone SVG or PNG file. The chart is drawn
 * with the page's stylesheet (Tailwind classes, the app's fonts), which a file opened on
 * its own does not have. So the clone gets every presentational property inlined from the
 * browser's computed style, and the @font-face rules of the faces its text uses are
 * embedded as data URLs. For PNG the finished SVG is drawn onto a canvas at twice its
 * size, which keeps lines and text sharp on a projector or in a printed report.
 */

const SVG_NS = 'http://www.w3.org/2000/svg';

/** The properties that change how SVG content looks; layout properties do not apply. */
const PRESENTATION = [
  'fill',
  'fill-opacity',
  'fill-rule',
  'stroke',
  'stroke-width',
  'stroke-opacity',
  'stroke-dasharray',
  'stroke-linecap',
  'stroke-linejoin',
  'opacity',
  'font-family',
  'font-size',
  'font-weight',
  'font-style',
  'font-variant-numeric',
  'letter-spacing',
  'text-anchor',
  'dominant-baseline',
  'visibility',
  'display',
  'paint-order',
] as const;

export type ChartExportOptions = {
  /** Written above the chart in the file, so an exported chart still says what it shows. */
  title: string;
  /** A second line: the scenario, the seed, the units. */
  subtitle?: string;
  /** File name without extension; derived from the title when absent. */
  filename?: string;
};

function copyComputedStyle(source: Element, target: Element): void {
  const computed = getComputedStyle(source);
  const declarations: string[] = [];
  for (const property of PRESENTATION) {
    const value = computed.getPropertyValue(property);
    if (value !== '') declarations.push(`${property}:${value}`);
  }
  target.setAttribute('style', declarations.join(';'));
  target.removeAttribute('class');
  const sourceChildren = source.children;
  const targetChildren = target.children;
  for (let i = 0; i < sourceChildren.length; i++) copyComputedStyle(sourceChildren[i], targetChildren[i]);
}

type Face = { family: string; weight: number; style: string };

const firstFamily = (fontFamily: string) =>
  fontFamily
    .split(',')[0]
    .trim()
    .replace(/^["']|["']$/g, '');

/** The faces the chart's text is set in, as the browser resolved them. */
function facesUsed(svg: SVGSVGElement): Face[] {
  const faces = new Map<string, Face>();
  for (const el of svg.querySelectorAll('text, tspan')) {
    const cs = getComputedStyle(el);
    const face = {
      family: firstFamily(cs.fontFamily),
      weight: Number(cs.fontWeight) || 400,
      style: cs.fontStyle,
    };
    faces.set(`${face.family}|${face.weight}|${face.style}`, face);
  }
  return [...faces.values()];
}

/** "U+0000-00FF, U+0131" → ranges of code points; an absent descriptor covers everything. */
function parseUnicodeRange(descriptor: string): [number, number][] {
  if (descriptor.trim() === '') return [[0, 0x10ffff]];
  return descriptor.split(',').map((part) => {
    const [from, to] = part.trim().replace(/^u\+/i, '').split('-');
    if (from.includes('?')) {
      return [parseInt(from.replace(/\?/g, '0'), 16), parseInt(from.replace(/\?/g, 'f'), 16)];
    }
    const start = parseInt(from, 16);
    return [start, to === undefined ? start : parseInt(to, 16)];
  });
}

function weightMatches(descriptor: string, weight: number): boolean {
  const [low, high] = descriptor.trim().split(/\s+/).map(Number);
  if (!Number.isFinite(low)) return descriptor.trim() === 'normal' ? weight === 400 : true;
  return high === undefined ? low === weight : weight >= low && weight <= high;
}

async function asDataUrl(url: string): Promise<string> {
  const response = await fetch(url);
  if (!response.ok) throw new Error(`font ${url}: HTTP ${response.status}`);
  const blob = await response.blob();
  return new Promise((resolve, reject) => {
    const reader = new FileReader();
    reader.onload = () => resolve(String(reader.result));
    reader.onerror = () => reject(reader.error);
    reader.readAsDataURL(blob);
  });
}

/**
 * @font-face rules for the faces the chart uses, limited to the unicode-range subsets that
 * its text needs (Latin, plus Greek for λ), each font file embedded as a data URL.
 */
async function embeddedFontCss(svg: SVGSVGElement): Promise<string> {
  const faces = facesUsed(svg);
  const codePoints = new Set<number>();
  for (const ch of svg.textContent ?? '') codePoints.add(ch.codePointAt(0)!);
  const wanted: { rule: CSSFontFaceRule; url: string }[] = [];
  for (const sheet of document.styleSheets) {
    let rules: CSSRuleList;
    try {
      rules = sheet.cssRules;
    } catch {
      continue; // a cross-origin sheet cannot be read; the app ships none
    }
    for (const rule of rules) {
      if (!(rule instanceof CSSFontFaceRule)) continue;
      const family = firstFamily(rule.style.getPropertyValue('font-family'));
      const style = rule.style.getPropertyValue('font-style') || 'normal';
      const weight = rule.style.getPropertyValue('font-weight') || '400';
      const used = faces.some(
        (f) => f.family === family && f.style === style && weightMatches(weight, f.weight),
      );
      if (!used) continue;
      const ranges = parseUnicodeRange(rule.style.getPropertyValue('unicode-range'));
      const needed = [...codePoints].some((cp) => ranges.some(([a, b]) => cp >= a && cp <= b));
      if (!needed) continue;
      const src = /url\(["']?([^"')]+)["']?\)/.exec(rule.style.getPropertyValue('src'));
      if (src) wanted.push({ rule, url: new URL(src[1], sheet.href ?? document.baseURI).href });
    }
  }
  const embedded = await Promise.all(
    wanted.map(async ({ rule, url }) => {
      const data = await asDataUrl(url);
      const s = rule.style;
      return `@font-face{font-family:"${firstFamily(s.getPropertyValue('font-family'))}";font-style:${s.getPropertyValue('font-style') || 'normal'};font-weight:${s.getPropertyValue('font-weight') || '400'};src:url(${data});unicode-range:${s.getPropertyValue('unicode-range') || 'U+0-10FFFF'}}`;
    }),
  );
  return embedded.join('\n');
}

type Serialised = { text: string; width: number; height: number };

/** The chart as a stand-alone SVG document, with a white sheet, its title and its fonts. */
export async function serialiseChart(svg: SVGSVGElement, options: ChartExportOptions): Promise<Serialised> {
  const box = svg.getBoundingClientRect();
  const width = Math.round(box.width);
  const chartHeight = Math.round(box.height);
  const header = options.subtitle ? 52 : 34;
  const height = chartHeight + header;

  const clone = svg.cloneNode(true) as SVGSVGElement;
  copyComputedStyle(svg, clone);
  // Controls drawn inside the chart (a focus outline, a hover line) do not belong in a file.
  for (const el of clone.querySelectorAll('[data-export="skip"]')) el.remove();

  const out = document.createElementNS(SVG_NS, 'svg');
  out.setAttribute('xmlns', SVG_NS);
  out.setAttribute('width', String(width));
  out.setAttribute('height', String(height));
  out.setAttribute('viewBox', `0 0 ${width} ${height}`);

  const style = document.createElementNS(SVG_NS, 'style');
  style.textContent = await embeddedFontCss(svg);
  out.append(style);

  const sheet = document.createElementNS(SVG_NS, 'rect');
  sheet.setAttribute('width', String(width));
  sheet.setAttribute('height', String(height));
  sheet.setAttribute('fill', '#ffffff');
  out.append(sheet);

  const textStyle = getComputedStyle(svg.querySelector('text') ?? svg);
  const family = textStyle.fontFamily;
  const title = document.createElementNS(SVG_NS, 'text');
  title.setAttribute('x', '12');
  title.setAttribute('y', '22');
  title.setAttribute('style', `font-family:${family};font-size:15px;font-weight:600;fill:#241a13`);
  title.textContent = options.title;
  out.append(title);
  if (options.subtitle) {
    const sub = document.createElementNS(SVG_NS, 'text');
    sub.setAttribute('x', '12');
    sub.setAttribute('y', '41');
    sub.setAttribute('style', `font-family:${family};font-size:12px;fill:#5b4636`);
    sub.textContent = options.subtitle;
    out.append(sub);
  }

  const body = document.createElementNS(SVG_NS, 'g');
  body.setAttribute('transform', `translate(0 ${header})`);
  clone.removeAttribute('style');
  clone.setAttribute('width', String(width));
  clone.setAttribute('height', String(chartHeight));
  body.append(clone);
  out.append(body);

  const text = `<?xml version="1.0" encoding="UTF-8"?>\n${new XMLSerializer().serializeToString(out)}`;
  return { text, width, height };
}

export async function downloadChartSvg(svg: SVGSVGElement, options: ChartExportOptions): Promise<void> {
  const { text } = await serialiseChart(svg, options);
  downloadBlob(
    new Blob([text], { type: 'image/svg+xml' }),
    `${options.filename ?? fileSlug(options.title)}.svg`,
  );
}

function loadImage(url: string): Promise<HTMLImageElement> {
  return new Promise((resolve, reject) => {
    const image = new Image();
    image.onload = () => resolve(image);
    image.onerror = () => reject(new Error('The chart could not be drawn as an image.'));
    image.src = url;
  });
}

export async function downloadChartPng(
  svg: SVGSVGElement,
  options: ChartExportOptions & { scale?: number },
): Promise<void> {
  const { text, width, height } = await serialiseChart(svg, options);
  const scale = options.scale ?? 2;
  const url = URL.createObjectURL(new Blob([text], { type: 'image/svg+xml' }));
  try {
    const image = await loadImage(url);
    const canvas = document.createElement('canvas');
    canvas.width = width * scale;
    canvas.height = height * scale;
    const context = canvas.getContext('2d');
    if (!context) throw new Error('This browser cannot draw the chart as an image.');
    context.scale(scale, scale);
    context.drawImage(image, 0, 0, width, height);
    const png = await new Promise<Blob>((resolve, reject) =>
      canvas.toBlob((b) => (b ? resolve(b) : reject(new Error('The image could not be made.'))), 'image/png'),
    );
    downloadBlob(png, `${options.filename ?? fileSlug(options.title)}.png`);
  } finally {
    URL.revokeObjectURL(url);
  }
}
