// A seedbank chart drawn as PDF vectors: one median line per run with its 5–95 % band.
// Runs differ by dash pattern and grey level as well as colour, so the chart reads in
// black and white.
import type PDFKit from 'pdfkit';
import { scaleLinear } from 'd3';

export type ChartSeries = { label: string; median: number[]; q05: number[]; q95: number[] };

const styles = [
  { color: '#2a5f34', dash: [] as number[], band: '#dfeddb' },
  { color: '#83321c', dash: [6, 3], band: '#f7e2d8' },
  { color: '#86591c', dash: [2, 2], band: '#f4e6c8' },
  { color: '#33261c', dash: [8, 2, 2, 2], band: '#ebe2d2' },
  { color: '#347340', dash: [1, 3], band: '#dfeddb' },
  { color: '#6e4a17', dash: [10, 4], band: '#f4e6c8' },
];
const baseline = { color: '#000000', dash: [3, 3], band: '#e6e6e6' };

export function drawChart(
  doc: PDFKit.PDFDocument,
  x: number,
  y: number,
  w: number,
  h: number,
  series: ChartSeries[],
  yUnit: string,
  font: string,
) {
  const years = series[0]?.median.length ?? 1;
  const scale = scaleLinear()
    .domain([0, Math.max(1, ...series.flatMap((s) => s.q95.filter(Number.isFinite)))])
    .range([y + h, y])
    .nice(5);
  const top = scale.domain()[1];
  const sx = (t: number) => x + (t / Math.max(1, years - 1)) * w;
  const sy = (v: number) => scale(Math.min(v, top));
  doc.save().lineWidth(0.5).strokeColor('#888888');
  doc
    .moveTo(x, y)
    .lineTo(x, y + h)
    .lineTo(x + w, y + h)
    .stroke();
  doc.font(font).fontSize(7).fillColor('#333333');
  for (const v of scale.ticks(5))
    doc.text(v.toLocaleString('en'), x - 48, sy(v) - 3, { width: 44, align: 'right' });
  for (let t = 0; t < years; t += Math.max(1, Math.round(years / 10)))
    doc.text(String(t), sx(t) - 6, y + h + 3, { width: 12, align: 'center' });
  doc.text('year', x + w - 20, y + h + 12);
  doc.text(yUnit, x - 48, y - 12);
  series.forEach((s, i) => {
    const st = s.label === 'No control' ? baseline : styles[i % styles.length];
    doc.save().fillColor(st.band).fillOpacity(0.5);
    doc.moveTo(sx(0), sy(s.q95[0]));
    for (let t = 1; t < years; t++) doc.lineTo(sx(t), sy(s.q95[t]));
    for (let t = years - 1; t >= 0; t--) doc.lineTo(sx(t), sy(s.q05[t]));
    doc.fill().restore();
  });
  series.forEach((s, i) => {
    const st = s.label === 'No control' ? baseline : styles[i % styles.length];
    doc.save().lineWidth(1.4).strokeColor(st.color);
    if (st.dash.length) doc.dash(st.dash[0], { space: st.dash[1] ?? st.dash[0] });
    doc.moveTo(sx(0), sy(s.median[0]));
    for (let t = 1; t < years; t++) doc.lineTo(sx(t), sy(s.median[t]));
    doc.stroke().undash().restore();
    // Legend
    const ly = y + 4 + i * 11;
    doc.save().lineWidth(1.4).strokeColor(st.color);
    if (st.dash.length) doc.dash(st.dash[0], { space: st.dash[1] ?? st.dash[0] });
    doc
      .moveTo(x + w - 170, ly + 3)
      .lineTo(x + w - 150, ly + 3)
      .stroke()
      .undash()
      .restore();
    doc
      .font(font)
      .fontSize(7)
      .fillColor('#000000')
      .text(s.label, x + w - 146, ly, { width: 146, lineBreak: false, ellipsis: true });
  });
  doc.restore();
}
