import { existsSync } from 'node:fs';
import { SCORE_WORDS, formatScore } from '@shared/grading/score';
import { formatMinutes } from '@shared/schemas/log-entry';
import type { ApprenticeRecord, EvidenceItem, RecordCourse } from '@shared/schemas/record';
import { createPdf, INK, monoText } from '../../lib/pdf';
import { uploadFile } from '../uploads/upload-files';
import type { PortfolioDetails } from './portfolio-details';

const shortDate = (d: string) =>
  new Date(d).toLocaleDateString('en-GB', { day: 'numeric', month: 'short', year: 'numeric', timeZone: 'UTC' });
const STATUS_WORDS = {
  'not-started': 'not started',
  gathering: 'gathering evidence',
  ready: 'ready for sign-off',
  'signed-off': 'signed off',
} as const;
const MAX_PHOTO_HEIGHT = 300;

/**
 * The portfolio as a PDF: per course and skill, the standard, the evidence with its photos at display size, the
 * mentor's scores, comment and numbered pins, and the sign-off; then the bench-log hours by week. A piece that
 * serves several skills is shown in full under the first and named under the others.
 */
export function portfolioPdf(
  record: ApprenticeRecord,
  details: PortfolioDetails,
  { guild, dataDir }: { guild: string; dataDir: string },
): PDFKit.PDFDocument {
  const doc = createPdf({
    title: `Portfolio of ${record.apprentice.name}`,
    author: guild,
    subject: record.courses.map((c) => c.course.title).join(', '),
    keywords: 'portfolio',
  });
  const left = doc.page.margins.left;
  const width = doc.page.width - 2 * left;
  const bottom = () => doc.page.height - doc.page.margins.bottom;
  const room = (height: number) => {
    if (doc.y + height > bottom()) doc.addPage();
  };
  const heading = (text: string, size: number) => {
    room(size * 3);
    doc.font('heading').fontSize(size).fillColor(INK.ink).text(text, left, doc.y, { width });
    doc.moveDown(0.3);
  };
  const line = (text: string, font: 'text' | 'strong' = 'text', color = INK.ink, size = 10) => {
    doc.font(font).fontSize(size).fillColor(color).text(text, left, doc.y, { width });
  };

  doc.font('heading').fontSize(13).fillColor(INK.brass).text(guild);
  doc.moveDown(0.4);
  doc.font('heading').fontSize(26).fillColor(INK.ink).text(`Portfolio of ${record.apprentice.name}`);
  line(
    `Prepared on ${shortDate(new Date().toISOString())}. Photos are in the photos folder beside this file.`,
    'text',
    INK.muted,
  );
  doc.moveDown(1);

  const shown = new Map<string, string>();
  for (const course of record.courses) {
    heading(course.course.title, 20);
    line(`Bench time on this course’s lessons: ${formatMinutes(course.minutes)}.`, 'text', INK.muted);
    doc.moveDown(0.6);
    for (const skill of course.skills) {
      heading(skill.label, 14);
      line(`Standard: ${skill.standard}`, 'text', INK.muted);
      line(`Status: ${STATUS_WORDS[skill.status]} · ${formatMinutes(skill.minutes)} at the bench`, 'strong');
      doc.moveDown(0.3);
      if (skill.evidence.length === 0) line('No evidence yet.', 'text', INK.muted);
      for (const item of skill.evidence) {
        const key = `${item.kind}:${item.id}`;
        if (shown.has(key)) {
          line(`• ${describe(item)}: shown under “${shown.get(key)}”.`);
          continue;
        }
        shown.set(key, skill.label);
        evidence(item);
      }
      if (skill.signOff) {
        room(40);
        line(
          `Signed off on ${shortDate(skill.signOff.at)} by ${skill.signOff.by.name}: ${skill.signOff.note}`,
          'strong',
          INK.passed,
        );
      }
      doc.moveDown(0.8);
    }
    hoursByWeek(course);
  }
  doc.end();
  return doc;

  function describe(item: EvidenceItem) {
    const kind = { submission: 'Piece', 'log-entry': 'Log entry', calculation: 'Saved result' }[item.kind];
    const outcome = item.outcome ? `, ${item.outcome}` : item.kind === 'submission' ? ', waiting for review' : '';
    const score = item.score !== undefined ? `, score ${formatScore(item.score)} of 4` : '';
    return `${kind} “${item.title}”, ${shortDate(item.date)}${outcome}${score}`;
  }

  function evidence(item: EvidenceItem) {
    room(30);
    line(`• ${describe(item)}`, 'strong');
    const piece = item.kind === 'submission' ? details.pieces.get(item.id) : undefined;
    const entry = item.kind === 'log-entry' ? details.entries.get(item.id) : undefined;
    if (piece?.review) {
      for (const c of piece.review.scores)
        line(`   ${c.label}: ${c.score} (${SCORE_WORDS[c.score]})`, 'text', INK.ink, 9.5);
      if (piece.review.comment) line(`   ${piece.review.mentor}: ${piece.review.comment}`, 'text', INK.muted, 9.5);
      for (const pin of piece.review.pins) line(`   Pin ${pin.number}: ${pin.note}`, 'text', INK.muted, 9.5);
    }
    if (entry?.comment) line(`   ${entry.comment}`, 'text', INK.muted, 9.5);
    for (const photo of piece?.photos ?? entry?.photos ?? []) {
      const file = uploadFile(dataDir, photo.fileKey, 'view');
      if (!existsSync(file)) continue;
      const scale = Math.min(width / photo.width, MAX_PHOTO_HEIGHT / photo.height);
      const w = photo.width * scale;
      const h = photo.height * scale;
      room(h + 24);
      const top = doc.y + 4;
      doc.image(file, left, top, { width: w, height: h });
      for (const pin of piece?.review?.pins.filter((p) => p.uploadId === photo.uploadId) ?? []) {
        const x = left + pin.x * w;
        const y = top + pin.y * h;
        doc.circle(x, y, 8).fillAndStroke(INK.brass, '#ffffff');
        doc
          .font('strong')
          .fontSize(8)
          .fillColor('#ffffff')
          .text(String(pin.number), x - 8, y - 4, {
            width: 16,
            align: 'center',
          });
      }
      doc.y = top + h + 2;
      line(`${photo.caption ? `${photo.caption} · ` : ''}photos/${photo.name}`, 'text', INK.muted, 8.5);
      doc.moveDown(0.3);
    }
  }

  function hoursByWeek(course: RecordCourse) {
    if (!course.hours || course.hours.weeks.length === 0) return;
    const { hours } = course;
    heading(`Bench hours by week: ${hours.class.name}`, 14);
    if (hours.requiredMinutesPerWeek !== null)
      line(`The class asks for ${formatMinutes(hours.requiredMinutesPerWeek)} a week.`, 'text', INK.muted);
    for (const week of hours.weeks) {
      room(14);
      const y = doc.y;
      doc
        .font('text')
        .fontSize(9.5)
        .fillColor(INK.ink)
        .text(`Week of ${shortDate(week.weekStart)}`, left, y);
      doc.x = left + 160;
      doc.y = y;
      monoText(doc.fontSize(9.5), formatMinutes(week.minutes));
      doc.x = left;
      doc.y = y + 13;
    }
    line(
      `Logged ${formatMinutes(hours.loggedMinutes)}` +
        (hours.requiredMinutesPerWeek !== null ? ` of ${formatMinutes(hours.requiredMinutes)} asked to date.` : '.'),
      'strong',
    );
    doc.moveDown(1);
  }
}
