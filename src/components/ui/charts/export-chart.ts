// Saving a chart as a file: the SVG as drawn (with its fonts and colours written inline, so it opens
// on its own), or a PNG rendered from that SVG at twice the screen size for slides and reports.
const SVG_NS = 'http://www.w3.org/2000/svg';

function download(blob: Blob, fileName: string) {
  const url = URL.createObjectURL(blob);
  const a = document.createElement('a');
  a.href = url;
  a.download = fileName;
  document.body.append(a);
  a.click();
  a.remove();
  window.setTimeout(() => URL.revokeObjectURL(url), 1000);
}

/** A standalone copy of the chart: namespace, size, white background, a system font stack. */
export function serializeChart(svg: SVGSVGElement): string {
  const copy = svg.cloneNode(true) as SVGSVGElement;
  copy.setAttribute('xmlns', SVG_NS);
  const { width, height } = svg.getBoundingClientRect();
  copy.setAttribute('width', String(Math.round(width)));
  copy.setAttribute('height', String(Math.round(height)));
  copy.setAttribute('font-family', "'Source Sans 3', 'Helvetica Neue', Arial, sans-serif");
  const background = document.createElementNS(SVG_NS, 'rect');
  background.setAttribute('width', '100%');
  background.setAttribute('height', '100%');
  background.setAttribute('fill', '#ffffff');
  copy.insertBefore(background, copy.firstChild);
  copy.querySelectorAll('[data-export="skip"]').forEach((node) => node.remove());
  return new XMLSerializer().serializeToString(copy);
}

export function downloadSvg(svg: SVGSVGElement, fileName: string) {
  download(new Blob([serializeChart(svg)], { type: 'image/svg+xml;charset=utf-8' }), `${fileName}.svg`);
}

export async function downloadPng(svg: SVGSVGElement, fileName: string, scale = 2): Promise<void> {
  const { width, height } = svg.getBoundingClientRect();
  const url = URL.createObjectURL(new Blob([serializeChart(svg)], { type: 'image/svg+xml;charset=utf-8' }));
  try {
    const image = new Image();
    await new Promise<void>((resolve, reject) => {
      image.onload = () => resolve();
      image.onerror = () => reject(new Error('The chart could not be drawn as an image.'));
      image.src = url;
    });
    const canvas = document.createElement('canvas');
    canvas.width = Math.round(width * scale);
    canvas.height = Math.round(height * scale);
    const context = canvas.getContext('2d');
    if (!context) throw new Error('This browser cannot draw the chart as an image.');
    context.scale(scale, scale);
    context.drawImage(image, 0, 0, width, height);
    const blob = await new Promise<Blob | null>((resolve) => canvas.toBlob(resolve, 'image/png'));
    if (!blob) throw new Error('This browser cannot save the chart as PNG.');
    download(blob, `${fileName}.png`);
  } finally {
    URL.revokeObjectURL(url);
  }
}

/** A file name from a title: letters, digits and hyphens. */
export function chartFileName(title: string): string {
  return (
    title
      .normalize('NFKD')
      .replace(/[^\w.-]+/g, '-')
      .replace(/-+/g, '-')
      .replace(/^-|-$/g, '')
      .slice(0, 80) || 'chart'
  );
}
