/**
 * The drawing as a stand-alone SVG file: the app's classes and inline styles are dropped because they mean nothing
 * outside the page (colours and sizes are plain attributes), and the width and height stay in mm for a 1:1 print.
 */
export function svgFileText(svg: SVGSVGElement): string {
  const copy = svg.cloneNode(true) as SVGSVGElement;
  for (const el of [copy, ...copy.querySelectorAll('*')]) {
    el.removeAttribute('class');
    el.removeAttribute('style');
    el.removeAttribute('data-testid');
  }
  copy.setAttribute('xmlns', 'http://www.w3.org/2000/svg');
  return new XMLSerializer().serializeToString(copy);
}

/** Hands the drawing to the browser as a download. */
export function saveSvg(svg: SVGSVGElement, fileName: string): void {
  const url = URL.createObjectURL(new Blob([svgFileText(svg)], { type: 'image/svg+xml' }));
  const link = document.createElement('a');
  link.href = url;
  link.download = fileName;
  document.body.append(link);
  link.click();
  link.remove();
  // Some browsers read the blob after the click returns; give them a moment before letting it go.
  setTimeout(() => URL.revokeObjectURL(url), 1000);
}

/** planting-2026-10-05.svg, by the local calendar date. */
export function plantingFileName(now: Date = new Date()): string {
  const pad = (n: number) => String(n).padStart(2, '0');
  return `planting-${now.getFullYear()}-${pad(now.getMonth() + 1)}-${pad(now.getDate())}.svg`;
}
