import sharp from 'sharp';

/**
 * Stand-in workshop photographs for the demo, drawn as SVG and rendered by sharp: no real photographs exist of the
 * invented guild's work. Each kind shows what its project asks to be photographed, roughly.
 */
export type DemoPhotoKind = 'holes' | 'arbor' | 'pivots' | 'plates' | 'click' | 'strip';

const W = 1600;
const H = 1200;
const BRASS = `<linearGradient id="brass" x1="0" y1="0" x2="1" y2="1"><stop offset="0" stop-color="#d9b25a"/><stop offset="0.5" stop-color="#b98d3a"/><stop offset="1" stop-color="#8e6a26"/></linearGradient>`;
const STEEL = `<linearGradient id="steel" x1="0" y1="0" x2="0" y2="1"><stop offset="0" stop-color="#d7dde4"/><stop offset="0.5" stop-color="#8d98a5"/><stop offset="1" stop-color="#5d6670"/></linearGradient>`;
const BENCH = `<rect width="${W}" height="${H}" fill="#3b3026"/><rect width="${W}" height="${H}" fill="url(#grain)" opacity="0.35"/>`;
const GRAIN = `<pattern id="grain" width="40" height="1200" patternUnits="userSpaceOnUse"><rect width="40" height="1200" fill="#4a3b2c"/><path d="M0 0 L40 1200" stroke="#2e251c" stroke-width="6"/></pattern>`;

/** A steel rule along the bottom with a tick every millimetre at an invented scale, so size can be judged. */
function rule(y: number) {
  const ticks = Array.from({ length: 121 }, (_, i) => {
    const x = 120 + i * 11;
    const len = i % 10 === 0 ? 34 : i % 5 === 0 ? 24 : 14;
    return `<line x1="${x}" y1="${y}" x2="${x}" y2="${y + len}" stroke="#222" stroke-width="2"/>`;
  }).join('');
  return `<rect x="100" y="${y - 6}" width="1380" height="70" rx="4" fill="url(#steel)"/>${ticks}`;
}

function hole(cx: number, cy: number, r: number) {
  return `<circle cx="${cx}" cy="${cy}" r="${r * 2.1}" fill="#c99f4a" stroke="#7a5a1d" stroke-width="3"/><circle cx="${cx}" cy="${cy}" r="${r * 1.35}" fill="#a5802f"/><circle cx="${cx}" cy="${cy}" r="${r}" fill="#111"/>`;
}

const scenes: Record<DemoPhotoKind, (v: number) => string> = {
  holes: (v) =>
    `<rect x="250" y="180" width="1100" height="700" rx="24" fill="url(#brass)" stroke="#6d5018" stroke-width="6"/>` +
    Array.from(
      { length: 14 },
      (_, i) =>
        `<line x1="${280 + i * 75}" y1="200" x2="${300 + i * 75}" y2="860" stroke="#e8c877" stroke-width="2" opacity="0.5"/>`,
    ).join('') +
    hole(560 + v * 10, 530, 34) +
    hole(1040 - v * 6, 530, 34) +
    rule(1000),
  arbor: (v) =>
    `<rect x="200" y="700" width="1200" height="90" fill="url(#brass)" stroke="#6d5018" stroke-width="4"/>` +
    `<rect x="${790 + v * 8}" y="180" width="26" height="540" fill="url(#steel)" transform="rotate(${v * 1.5} 803 720)"/>` +
    `<rect x="1000" y="200" width="40" height="500" fill="#c7ccd2" stroke="#555" stroke-width="3"/><rect x="1000" y="660" width="220" height="40" fill="#c7ccd2" stroke="#555" stroke-width="3"/>` +
    rule(1000),
  pivots: (v) =>
    `<rect x="300" y="520" width="1000" height="60" rx="10" fill="url(#steel)"/>` +
    `<rect x="180" y="535" width="120" height="30" rx="6" fill="url(#steel)"/><rect x="1300" y="${535 + v}" width="120" height="30" rx="6" fill="url(#steel)"/>` +
    `<circle cx="800" cy="550" r="170" fill="none" stroke="url(#brass)" stroke-width="60"/>` +
    rule(1000),
  plates: (v) =>
    `<rect x="180" y="160" width="560" height="760" rx="20" fill="url(#brass)" stroke="#6d5018" stroke-width="5"/>` +
    `<rect x="860" y="160" width="560" height="760" rx="20" fill="url(#brass)" stroke="#6d5018" stroke-width="5"/>` +
    [180, 860]
      .map(
        (x) =>
          `<line x1="${x + 280}" y1="180" x2="${x + 280 + v}" y2="900" stroke="#3a2a0a" stroke-width="3"/><line x1="${x + 20}" y1="540" x2="${x + 540}" y2="540" stroke="#3a2a0a" stroke-width="3"/>`,
      )
      .join('') +
    [180, 860]
      .map((x) =>
        [hole(x + 70, 220, 16), hole(x + 490, 220, 16), hole(x + 70, 860, 16), hole(x + 490, 860, 16)].join(''),
      )
      .join('') +
    rule(1000),
  click: (v) =>
    `<path d="M520 640 L900 ${420 + v * 6} Q1000 400 1040 470 L1010 520 Q940 520 880 560 L600 720 Z" fill="url(#steel)" stroke="#333" stroke-width="4"/>` +
    `<circle cx="560" cy="680" r="60" fill="url(#steel)" stroke="#333" stroke-width="4"/><circle cx="560" cy="680" r="18" fill="#111"/>` +
    rule(1000),
  // A strip run from pale straw through brown and purple to blue, as a tempered strip shows its colours.
  strip: (v) =>
    ['#e9d9a6', '#d9b867', '#b7803c', '#8a4f3a', '#6b3f6e', '#3d4f8f', '#5f7fb0']
      .map((c, i) => `<rect x="${220 + i * 165}" y="${460 + v * 4}" width="166" height="150" fill="${c}"/>`)
      .join('') +
    `<rect x="220" y="${460 + v * 4}" width="1155" height="150" fill="none" stroke="#333" stroke-width="4"/>` +
    rule(1000),
};

/** A JPEG for the demo; `variant` shifts the drawing a little so versions of one piece differ. */
export function demoPhoto(kind: DemoPhotoKind, variant = 0): Promise<Buffer> {
  const svg = `<svg xmlns="http://www.w3.org/2000/svg" width="${W}" height="${H}" viewBox="0 0 ${W} ${H}"><defs>${BRASS}${STEEL}${GRAIN}</defs>${BENCH}${scenes[kind](variant)}</svg>`;
  return sharp(Buffer.from(svg)).jpeg({ quality: 88 }).toBuffer();
}
