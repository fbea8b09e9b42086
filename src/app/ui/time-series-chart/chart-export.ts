/**
 * Turns a drawn chart into a stand-alone SVG document or a PNG image. Charts draw with
 * presentation attributes and `currentColor`, so the copy only needs a colour, a font and a
 * background to look the same outside the page.
 */

/** The chart as an SVG document (XML text) with a white background and dark text. */
export function chartSvgMarkup(svg: SVGSVGElement): string {
  const copy = svg.cloneNode(true) as SVGSVGElement;
  const [, , width = 800, height = 300] = (svg.getAttribute('viewBox') ?? '0 0 800 300')
    .split(' ')
    .map(Number);
  copy.setAttribute('xmlns', 'http://www.w3.org/2000/svg');
  copy.setAttribute('width', String(width));
  copy.setAttribute('height', String(height));
  copy.setAttribute('style', 'color:#1d2327;font-family:Roboto,Arial,sans-serif');
  const background = svg.ownerDocument.createElementNS('http://www.w3.org/2000/svg', 'rect');
  background.setAttribute('width', '100%');
  background.setAttribute('height', '100%');
  background.setAttribute('fill', '#ffffff');
  copy.insertBefore(background, copy.firstChild);
  return new XMLSerializer().serializeToString(copy);
}

/** The chart as a PNG image at `pixelRatio` times its SVG size. */
export async function chartPngBlob(svg: SVGSVGElement, pixelRatio = 2): Promise<Blob> {
  const markup = chartSvgMarkup(svg);
  const url = URL.createObjectURL(new Blob([markup], { type: 'image/svg+xml' }));
  try {
    const image = new Image();
    image.src = url;
    await image.decode();
    const canvas = document.createElement('canvas');
    canvas.width = image.width * pixelRatio;
    canvas.height = image.height * pixelRatio;
    const context = canvas.getContext('2d');
    if (!context)
      throw new Error('This browser cannot draw into a canvas; export the SVG instead.');
    context.scale(pixelRatio, pixelRatio);
    context.drawImage(image, 0, 0);
    return await new Promise<Blob>((resolve, reject) =>
      canvas.toBlob(
        (blob) =>
          blob
            ? resolve(blob)
            : reject(new Error('The PNG could not be made; export the SVG instead.')),
        'image/png',
      ),
    );
  } finally {
    URL.revokeObjectURL(url);
  }
}
