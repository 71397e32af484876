/// <reference types="node" />
import path from 'node:path';
import PDFDocument from 'pdfkit';
import { buildWalkReport, type ReportStep, type WalkReport } from '@/shared/walk-report';
import type { WalkPhoto } from '@/shared/schemas/walks';
import type { WalkService } from './walk-service';
import type { PhotoService } from './photo-service';

// Report colours follow components/theme.ts (ink, accent, caution) so print matches the app.
const INK = '#1E2A32';
const MUTED = '#4E5D68';
const ACCENT = '#0E7C74';
const CAUTION = '#B45309';
const LINE = '#D8D2C4';
const THUMB = 96;

/** "2026-12-01 14:03 UTC": the report is read away from the shop, so the zone is named. */
export const stamp = (iso: string | null) => (iso ? `${iso.slice(0, 10)} ${iso.slice(11, 16)} UTC` : '—');

/** Builds walk reports as PDF files for the customer and the repair order. */
export function createReportService(deps: { walks: WalkService; photos: PhotoService; fontsDir: string }) {
  const font = (name: string) => path.join(deps.fontsDir, `NunitoSans_${name}.ttf`);

  return {
    /** The PDF of one walk, with its file name. */
    async walkPdf(shopId: number, walkId: number): Promise<{ data: Buffer; filename: string }> {
      const detail = await deps.walks.get(shopId, walkId);
      const report = buildWalkReport(detail);
      const thumbs = new Map<string, Buffer>();
      for (const p of detail.photos) thumbs.set(p.id, (await deps.photos.read(shopId, p.id, 'thumb')).data);

      const doc = new PDFDocument({ size: 'A4', margin: 48, info: { Title: report.title, Author: report.shopName, Creator: 'Baywalk' } });
      doc.registerFont('regular', font('400Regular'));
      doc.registerFont('semibold', font('600SemiBold'));
      doc.registerFont('bold', font('700Bold'));
      const chunks: Buffer[] = [];
      doc.on('data', (c: Buffer) => chunks.push(c));
      const finished = new Promise<void>((resolve) => doc.on('end', () => resolve()));
      render(doc, report, thumbs);
      doc.end();
      await finished;
      const ro = (detail.job?.roNumber ?? `walk-${walkId}`).replace(/[^A-Za-z0-9_-]+/g, '-');
      return { data: Buffer.concat(chunks), filename: `baywalk-${ro}-walk-${walkId}.pdf` };
    },
  };
}

type Doc = InstanceType<typeof PDFDocument>;

function render(doc: Doc, r: WalkReport, thumbs: Map<string, Buffer>) {
  const width = doc.page.width - 96;
  const heading = (text: string) => {
    ensureRoom(doc, 60);
    doc.moveDown(0.8).font('bold').fontSize(14).fillColor(ACCENT).text(text);
    doc.moveTo(48, doc.y + 2).lineTo(48 + width, doc.y + 2).strokeColor(LINE).lineWidth(1).stroke();
    doc.moveDown(0.4).fillColor(INK);
  };
  const field = (label: string, value: string | null | undefined) => {
    if (!value) return;
    doc.font('semibold').fontSize(10).fillColor(MUTED).text(`${label}  `, { continued: true }).font('regular').fontSize(11).fillColor(INK).text(value);
  };

  doc.font('bold').fontSize(20).fillColor(INK).text(r.title);
  doc.font('regular').fontSize(11).fillColor(MUTED).text(`${r.shopName} · ${r.treeTitle} (version ${r.treeVersion})`);

  heading('Job and vehicle');
  if (r.job) {
    field('Repair order', r.job.roNumber);
    field('Customer', r.job.customerName);
    field('Vehicle', r.job.vehicle);
    field('VIN', r.job.vin);
    field('Mileage', r.job.mileage !== null ? r.job.mileage.toLocaleString('en-US') : null);
    field('Install', r.job.install.join('; '));
  } else field('Job', 'No job: a walk sent by link');

  heading('Result');
  field('Outcome', r.outcome ?? 'Walk still open');
  field(r.end.kind === 'cause' ? 'Cause found' : r.end.kind === 'refer' ? 'Handed over' : 'Stopped at', r.end.title);
  if (r.end.cause) {
    field('Where', r.end.cause.area);
    field('Fix', r.end.cause.fix);
  }
  if (r.end.refer) field('To', `${r.end.refer.to}: ${r.end.refer.reason}`);
  if (r.causeText && r.causeText !== r.end.title) field('Cause noted', r.causeText);
  field('Note', r.finishNote);
  photoRow(doc, r.end.photos, thumbs);
  field('Technician', r.technician);
  field('Started', stamp(r.startedAt));
  field('Finished', r.finishedAt ? stamp(r.finishedAt) : null);
  field('Time spent', r.timeSpent);

  if (r.cautions.length) {
    heading('Safety cautions that applied');
    for (const c of r.cautions) {
      ensureRoom(doc, 40);
      // Nunito Sans has no warning sign glyph: a drawn triangle and the word carry the meaning.
      warningSign(doc, 48, doc.y + 1);
      doc.x = 48 + 16;
      doc.font('bold').fontSize(10.5).fillColor(CAUTION).text(`CAUTION: ${c.title}. `, { continued: true }).font('regular').fillColor(INK).text(c.text);
      doc.x = 48;
      doc.moveDown(0.2);
    }
  }

  heading(`Steps (${r.steps.length})`);
  if (!r.steps.length) doc.font('regular').fontSize(11).text('No answers recorded yet.');
  r.steps.forEach((s, i) => stepBlock(doc, s, i + 1, thumbs));

  doc.moveDown(1).font('regular').fontSize(9).fillColor(MUTED);
  doc.text(r.context);
  if (r.undoneCount) doc.text(`${r.undoneCount} answer(s) were taken back during the walk; the full history is kept in Baywalk.`);
  doc.text('Follow the vehicle maker’s service information, local codes and licensed practice.');
}

function stepBlock(doc: Doc, s: ReportStep, n: number, thumbs: Map<string, Buffer>) {
  ensureRoom(doc, s.photos.length ? 90 + THUMB : 80);
  doc.font('bold').fontSize(11.5).fillColor(INK).text(`${n}. ${s.title}`);
  doc.font('semibold').fontSize(10.5).fillColor(INK).text(`Answer: ${s.answer}`);
  if (s.verdict) {
    const word = s.verdict.tone === 'ok' ? 'In range' : s.verdict.tone === 'problem' ? 'Fault' : 'Check';
    doc.font('bold').fillColor(s.verdict.tone === 'ok' ? ACCENT : CAUTION).text(`Verdict: ${s.verdict.word} (${word})`);
  }
  if (s.summary) doc.font('regular').fontSize(10).fillColor(INK).text(s.summary);
  if (s.note) doc.font('regular').fontSize(10).fillColor(INK).text(`Note: ${s.note}`);
  doc.font('regular').fontSize(9).fillColor(MUTED).text([s.by, stamp(s.at)].filter(Boolean).join(' · '));
  photoRow(doc, s.photos, thumbs);
  doc.moveDown(0.5);
}

function photoRow(doc: Doc, photos: WalkPhoto[], thumbs: Map<string, Buffer>) {
  if (!photos.length) return;
  ensureRoom(doc, THUMB + 16);
  const top = doc.y + 4;
  photos.slice(0, 5).forEach((p, i) => {
    const data = thumbs.get(p.id);
    if (data) doc.image(data, 48 + i * (THUMB + 8), top, { fit: [THUMB, THUMB] });
  });
  doc.y = top + THUMB + 6;
  doc.x = 48;
  if (photos.length > 5) doc.font('regular').fontSize(9).fillColor(MUTED).text(`${photos.length - 5} more photo(s) in Baywalk.`);
}

function warningSign(doc: Doc, x: number, y: number) {
  doc.save().polygon([x + 6, y], [x + 12, y + 11], [x, y + 11]).fillColor(CAUTION).fill();
  doc.font('bold').fontSize(8).fillColor('#FFFFFF').text('!', x + 4.6, y + 2.5, { lineBreak: false });
  doc.restore();
}

function ensureRoom(doc: Doc, needed: number) {
  if (doc.y + needed > doc.page.height - doc.page.margins.bottom) doc.addPage();
}
