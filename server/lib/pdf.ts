import { createRequire } from 'node:module';
import PDFDocument from 'pdfkit';
import QRCode from 'qrcode';

const require = createRequire(import.meta.url);

/**
 * The app's own typefaces, shipped with it: Fraunces for headings, Inter for text, JetBrains Mono for figures and
 * codes. The client uses the variable WOFF2 files; PDFKit's subsetter breaks composite glyphs (é, “, ·) read from
 * WOFF2, so print takes the static WOFF files of the same families. The Latin subsets cover the product's words and
 * most names.
 */
const FONT_FILES = {
  heading: '@fontsource/fraunces/files/fraunces-latin-600-normal.woff',
  text: '@fontsource/inter/files/inter-latin-400-normal.woff',
  strong: '@fontsource/inter/files/inter-latin-600-normal.woff',
  mono: '@fontsource/jetbrains-mono/files/jetbrains-mono-latin-400-normal.woff',
} as const;
export type PdfFont = keyof typeof FONT_FILES;

/** The look-and-feel tokens of PRODUCT.md, in print. */
export const INK = { ink: '#1f2328', muted: '#5b5f66', rule: '#e3dccb', brass: '#a8802f', passed: '#2f6b4f' };

export interface PdfInfo {
  title: string;
  author: string;
  subject: string;
  keywords: string;
}

/** An A4 document with the shipped fonts registered by role; write to it, then `end()` and read the stream. */
export function createPdf(info: PdfInfo): PDFKit.PDFDocument {
  const doc = new PDFDocument({
    size: 'A4',
    margin: 56,
    info: { Title: info.title, Author: info.author, Subject: info.subject, Keywords: info.keywords },
    bufferPages: false,
  });
  for (const [name, file] of Object.entries(FONT_FILES)) doc.registerFont(name, require.resolve(file));
  doc.font('text').fillColor(INK.ink);
  return doc;
}

/**
 * Figures, codes and links in JetBrains Mono, printed as typed: its code ligatures ("//", "->") are glyphs PDFKit
 * cannot subset, so they are switched off (fontkit takes a feature map where PDFKit's types only allow a list).
 */
export function monoText(doc: PDFKit.PDFDocument, text: string, options: PDFKit.Mixins.TextOptions = {}) {
  const asTyped = { liga: false, calt: false } as unknown as PDFKit.Mixins.TextOptions['features'];
  return doc.font('mono').text(text, { ...options, features: asTyped });
}

/** A QR code drawn as vector squares (crisp at any print size), `size` points wide, with its quiet zone. */
export function drawQrCode(doc: PDFKit.PDFDocument, text: string, x: number, y: number, size: number) {
  const qr = QRCode.create(text, { errorCorrectionLevel: 'M' });
  const count = qr.modules.size;
  const quiet = 4;
  const cell = size / (count + 2 * quiet);
  doc.save().rect(x, y, size, size).fill('#ffffff');
  doc.fillColor('#000000');
  for (let row = 0; row < count; row++) {
    for (let col = 0; col < count; col++) {
      if (qr.modules.get(row, col)) doc.rect(x + (col + quiet) * cell, y + (row + quiet) * cell, cell, cell);
    }
  }
  doc.fill().restore();
}
