import type { Sequelize } from 'sequelize';
import { formatMinutes } from '@shared/schemas/log-entry';
import { createPdf, drawQrCode, INK, monoText } from '../../lib/pdf';
import { User } from '../auth/user.model';
import { Course } from '../courses/course.model';
import type { Certificate } from './record.model';
import { courseRecord } from './record.service';

const longDate = (d: Date | string) =>
  new Date(d).toLocaleDateString('en-GB', { day: 'numeric', month: 'long', year: 'numeric', timeZone: 'UTC' });

const verifyLink = (appUrl: string, code: string) => `${appUrl}/verify/${code}`;

/**
 * The certificate as a one-page PDF: the guild, the apprentice, the course, each skill with the date and mentor of its
 * sign-off, the hours at the bench, the date of issue, the code and a QR code of the public check link.
 */
export async function certificatePdf(
  sequelize: Sequelize,
  certificate: Certificate,
  { guild, appUrl }: { guild: string; appUrl: string },
): Promise<PDFKit.PDFDocument> {
  const apprentice = (await User.findByPk(certificate.apprenticeId, { attributes: ['name'] }))?.name ?? 'Former member';
  const course = (await Course.findByPk(certificate.courseId))!;
  const record = await courseRecord(sequelize, certificate.apprenticeId, course);
  const link = verifyLink(appUrl, certificate.code);

  const doc = createPdf({
    title: `Certificate ${certificate.code}: ${apprentice}, ${course.title}`,
    author: guild,
    subject: `${course.title}, completed by ${apprentice}`,
    keywords: certificate.code,
  });
  const width = doc.page.width - 2 * doc.page.margins.left;
  doc.font('heading').fontSize(15).fillColor(INK.brass).text(guild, { align: 'center' });
  doc.moveDown(1.2);
  doc.font('heading').fontSize(30).fillColor(INK.ink).text('Certificate', { align: 'center' });
  doc.moveDown(0.8);
  doc.font('text').fontSize(12).fillColor(INK.muted).text('This certifies that', { align: 'center' });
  doc.moveDown(0.3);
  doc.font('heading').fontSize(24).fillColor(INK.ink).text(apprentice, { align: 'center' });
  doc.moveDown(0.3);
  doc.font('text').fontSize(12).fillColor(INK.muted).text('has completed the course', { align: 'center' });
  doc.moveDown(0.3);
  doc.font('heading').fontSize(18).fillColor(INK.ink).text(course.title, { align: 'center' });
  doc.moveDown(0.6);
  doc
    .font('text')
    .fontSize(11)
    .fillColor(INK.muted)
    .text(
      `with every project passed and every skill signed off by a mentor, after ${formatMinutes(record.minutes)} at the bench.`,
      { align: 'center' },
    );
  doc.moveDown(1.2);

  doc.font('heading').fontSize(13).fillColor(INK.ink).text('Skills signed off');
  doc
    .moveTo(doc.page.margins.left, doc.y + 2)
    .lineTo(doc.page.margins.left + width, doc.y + 2)
    .strokeColor(INK.brass)
    .stroke();
  doc.moveDown(0.5);
  for (const skill of record.skills) {
    const y = doc.y;
    doc
      .font('text')
      .fontSize(10.5)
      .fillColor(INK.ink)
      .text(skill.label, doc.page.margins.left, y, { width: width * 0.55 });
    const afterLabel = doc.y;
    const signed = skill.signOff ? `${longDate(skill.signOff.at)} · ${skill.signOff.by.name}` : 'not signed off';
    doc
      .font('text')
      .fontSize(10)
      .fillColor(INK.muted)
      .text(signed, doc.page.margins.left + width * 0.58, y, { width: width * 0.42, align: 'right' });
    doc.y = Math.max(afterLabel, doc.y) + 4;
  }
  doc.moveDown(1);

  const top = doc.y;
  const qrSize = 110;
  const left = doc.page.margins.left;
  doc
    .font('text')
    .fontSize(10.5)
    .fillColor(INK.ink)
    .text(`Issued on ${longDate(certificate.issuedAt)}`, left, top);
  doc.moveDown(0.4);
  doc.font('text').fontSize(10).fillColor(INK.muted).text('Certificate code');
  monoText(doc.fontSize(13).fillColor(INK.ink), certificate.code);
  doc.moveDown(0.4);
  doc
    .font('text')
    .fontSize(9.5)
    .fillColor(INK.muted)
    .text('Anyone may check it at', { width: width - qrSize - 16 });
  monoText(doc.fontSize(9).fillColor(INK.ink), link, { width: width - qrSize - 16 });
  if (certificate.revokedAt) {
    doc.moveDown(0.6);
    doc
      .font('text')
      .fontSize(11)
      .fillColor('#a1262b')
      .text(`Revoked on ${longDate(certificate.revokedAt)}.`);
  }
  drawQrCode(doc, link, left + width - qrSize, top, qrSize);
  doc.end();
  return doc;
}
