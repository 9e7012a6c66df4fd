/**
 * Diagrams as files: an on-screen SVG serialised with its computed presentation styles inlined (so it
 * looks the same outside the app), and the same image rasterised to PNG through a canvas.
 */

const STYLE_PROPS = [
  'fill', 'fill-opacity', 'stroke', 'stroke-width', 'stroke-opacity', 'stroke-dasharray', 'opacity', 'font-family', 'font-size',
  'font-weight', 'text-anchor', 'dominant-baseline', 'visibility', 'display',
] as const;

/** The SVG element as standalone SVG text (inlined styles, explicit size, white background when `background` is set). */
export function serializeSvg(svg: SVGSVGElement, background: string | null = '#ffffff'): { text: string; width: number; height: number } {
  const box = svg.getBoundingClientRect();
  const width = Math.max(1, Math.round(box.width || Number(svg.getAttribute('width')) || 800));
  const height = Math.max(1, Math.round(box.height || Number(svg.getAttribute('height')) || 600));
  const clone = svg.cloneNode(true) as SVGSVGElement;
  const source = [svg, ...svg.querySelectorAll('*')];
  const target = [clone, ...clone.querySelectorAll('*')];
  source.forEach((el, i) => {
    const cs = getComputedStyle(el);
    const decl = STYLE_PROPS.map((p) => `${p}:${cs.getPropertyValue(p)}`).filter((d) => !d.endsWith(':')).join(';');
    (target[i] as SVGElement).setAttribute('style', decl);
    (target[i] as SVGElement).removeAttribute('class');
  });
  clone.setAttribute('xmlns', 'http://www.w3.org/2000/svg');
  clone.setAttribute('width', String(width));
  clone.setAttribute('height', String(height));
  if (!clone.getAttribute('viewBox')) clone.setAttribute('viewBox', `0 0 ${width} ${height}`);
  if (background) {
    const rect = document.createElementNS('http://www.w3.org/2000/svg', 'rect');
    const [x, y, w, h] = clone.getAttribute('viewBox')!.split(/[\s,]+/).map(Number);
    Object.entries({ x, y, width: w, height: h, fill: background }).forEach(([k, v]) => rect.setAttribute(k, String(v)));
    clone.insertBefore(rect, clone.firstChild);
  }
  return { text: `<?xml version="1.0" encoding="UTF-8"?>\n${new XMLSerializer().serializeToString(clone)}`, width, height };
}

/** Rasterise SVG text to a PNG blob at `scale` device pixels per CSS pixel. */
export function svgToPng(svg: { text: string; width: number; height: number }, scale = 2): Promise<Blob> {
  return new Promise((resolve, reject) => {
    const url = URL.createObjectURL(new Blob([svg.text], { type: 'image/svg+xml' }));
    const img = new Image();
    img.onload = () => {
      const canvas = document.createElement('canvas');
      canvas.width = Math.round(svg.width * scale);
      canvas.height = Math.round(svg.height * scale);
      const ctx = canvas.getContext('2d');
      if (!ctx) return reject(new Error('This browser cannot draw on a canvas.'));
      ctx.drawImage(img, 0, 0, canvas.width, canvas.height);
      URL.revokeObjectURL(url);
      canvas.toBlob((b) => (b ? resolve(b) : reject(new Error('The PNG could not be made.'))), 'image/png');
    };
    img.onerror = () => {
      URL.revokeObjectURL(url);
      reject(new Error('The diagram could not be rasterised.'));
    };
    img.src = url;
  });
}

/** Diagrams on the page that offer themselves for export: `<svg data-diagram="Name">`. */
export function findDiagrams(root: ParentNode = document): { name: string; svg: SVGSVGElement }[] {
  return [...root.querySelectorAll<SVGSVGElement>('svg[data-diagram]')].map((svg) => ({ name: svg.dataset.diagram || 'Diagram', svg }));
}
