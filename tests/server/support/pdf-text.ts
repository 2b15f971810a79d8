import { inflateSync } from 'node:zlib';

/**
 * The text a PDF shows, read the way a PDF reader reads it: content streams inflated, each text run decoded through
 * the ToUnicode map of the font selected for it. Enough for the PDFs PDFKit writes (embedded subset fonts with
 * Identity-H encoding, hex strings in TJ arrays); one line per text operator.
 */
export function pdfText(pdf: Buffer): string {
  const raw = pdf.toString('latin1');
  const objects = new Map<number, { dict: string; stream: Buffer | null }>();
  for (const m of raw.matchAll(/(\d+) 0 obj([\s\S]*?)endobj/g)) {
    const body = m[2];
    const at = body.indexOf('stream\n');
    if (at < 0) {
      objects.set(Number(m[1]), { dict: body, stream: null });
      continue;
    }
    const dict = body.slice(0, at);
    const bytes = Buffer.from(body.slice(at + 'stream\n'.length, body.lastIndexOf('\nendstream')), 'latin1');
    objects.set(Number(m[1]), { dict, stream: dict.includes('/FlateDecode') ? inflateSync(bytes) : bytes });
  }

  const cmapOf = new Map<number, Map<number, string>>();
  for (const [id, obj] of objects) {
    const ref = /\/ToUnicode (\d+) 0 R/.exec(obj.dict);
    const stream = ref && objects.get(Number(ref[1]))?.stream;
    if (stream) cmapOf.set(id, parseCmap(stream.toString('latin1')));
  }
  const fontByName = new Map<string, Map<number, string>>();
  for (const obj of objects.values()) {
    for (const m of obj.dict.matchAll(/\/(F\d+) (\d+) 0 R/g)) {
      const cmap = cmapOf.get(Number(m[2]));
      if (cmap) fontByName.set(m[1], cmap);
    }
  }

  const lines: string[] = [];
  for (const obj of objects.values()) {
    if (!obj.stream || !obj.dict.includes('/Length') || obj.dict.includes('/Length1')) continue;
    const content = obj.stream.toString('latin1');
    if (!/\bTf\b/.test(content)) continue;
    let cmap: Map<number, string> | undefined;
    for (const m of content.matchAll(/\/(F\d+) [\d.]+ Tf|\[((?:[^\]])*)\] TJ|<([0-9a-fA-F]*)> Tj/g)) {
      if (m[1]) cmap = fontByName.get(m[1]);
      else {
        const hexes = m[2] !== undefined ? [...m[2].matchAll(/<([0-9a-fA-F]*)>/g)].map((h) => h[1]) : [m[3]];
        lines.push(hexes.map((h) => decode(h, cmap)).join(''));
      }
    }
  }
  return lines.join('\n');
}

function decode(hex: string, cmap: Map<number, string> | undefined): string {
  let out = '';
  for (let i = 0; i + 4 <= hex.length; i += 4) out += cmap?.get(parseInt(hex.slice(i, i + 4), 16)) ?? '\uFFFD';
  return out;
}

const utf16 = (hex: string) => {
  const units: number[] = [];
  for (let i = 0; i + 4 <= hex.length; i += 4) units.push(parseInt(hex.slice(i, i + 4), 16));
  return String.fromCharCode(...units);
};

function parseCmap(text: string): Map<number, string> {
  const map = new Map<number, string>();
  for (const block of text.matchAll(/beginbfrange([\s\S]*?)endbfrange/g)) {
    for (const m of block[1].matchAll(/<([0-9a-fA-F]+)>\s*<([0-9a-fA-F]+)>\s*(\[[^\]]*\]|<[0-9a-fA-F]+>)/g)) {
      const start = parseInt(m[1], 16);
      const end = parseInt(m[2], 16);
      if (m[3].startsWith('[')) {
        // A ligature maps to several characters, written with spaces between them: <0066 0069>.
        [...m[3].matchAll(/<([0-9a-fA-F\s]+)>/g)].forEach((u, i) => map.set(start + i, utf16(u[1].replace(/\s/g, ''))));
      } else {
        const first = parseInt(m[3].slice(1, -1), 16);
        for (let code = start; code <= end; code++) map.set(code, String.fromCharCode(first + code - start));
      }
    }
  }
  for (const block of text.matchAll(/beginbfchar([\s\S]*?)endbfchar/g)) {
    for (const m of block[1].matchAll(/<([0-9a-fA-F]+)>\s*<([0-9a-fA-F\s]+)>/g))
      map.set(parseInt(m[1], 16), utf16(m[2].replace(/\s/g, '')));
  }
  return map;
}
