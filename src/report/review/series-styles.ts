/**
 * How the report's charts tell series apart on a black-and-white print: each
 * series has a dash pattern and a marker shape as well as a colour, so
 * nothing depends on colour alone.
 */

/** One series' look. `dash` is an SVG stroke-dasharray ('' for solid). */
export interface SeriesStyle {
  colour: string;
  dash: string;
  marker: MarkerShape;
}

/** Marker shapes drawn at a few points along each series. */
export type MarkerShape = 'circle' | 'square' | 'triangle' | 'diamond' | 'cross' | 'plus';

/** Dark colours that stay distinct in greyscale (darkest first). */
const COLOURS = ['#1f3b73', '#8a2d1c', '#245c2b', '#5b3a7a', '#6b5300', '#3d3d3d'];
const DASHES = ['', '7 3', '2 2.5', '9 3 2 3', '4 4', '12 3 2 3 2 3'];
const MARKERS: MarkerShape[] = ['circle', 'square', 'triangle', 'diamond', 'cross', 'plus'];

/** The style of the i-th series of a chart (cycles after six, shifting the marker so pairs stay unique up to 36). */
export function seriesStyle(i: number): SeriesStyle {
  const n = COLOURS.length;
  return { colour: COLOURS[i % n], dash: DASHES[i % n], marker: MARKERS[(i + Math.floor(i / n)) % n] };
}

/** SVG for one marker centred at (x, y), in px; `size` is its half-width. */
export function markerSvg(shape: MarkerShape, x: number, y: number, colour: string, size = 3.2): string {
  const p = (pts: [number, number][]) => pts.map(([a, b]) => `${(x + a * size).toFixed(1)},${(y + b * size).toFixed(1)}`).join(' ');
  const filled = `fill="${colour}" stroke="${colour}"`;
  const hollow = `fill="#fff" stroke="${colour}" stroke-width="1.2"`;
  switch (shape) {
    case 'circle':
      return `<circle cx="${x.toFixed(1)}" cy="${y.toFixed(1)}" r="${size}" ${filled}/>`;
    case 'square':
      return `<polygon points="${p([[-1, -1], [1, -1], [1, 1], [-1, 1]])}" ${hollow}/>`;
    case 'triangle':
      return `<polygon points="${p([[0, -1.2], [1.1, 0.9], [-1.1, 0.9]])}" ${filled}/>`;
    case 'diamond':
      return `<polygon points="${p([[0, -1.3], [1.3, 0], [0, 1.3], [-1.3, 0]])}" ${hollow}/>`;
    case 'cross':
      return `<path d="M${p([[-1, -1]])}L${p([[1, 1]])}M${p([[-1, 1]])}L${p([[1, -1]])}" stroke="${colour}" stroke-width="1.5"/>`;
    case 'plus':
      return `<path d="M${p([[-1.2, 0]])}L${p([[1.2, 0]])}M${p([[0, -1.2]])}L${p([[0, 1.2]])}" stroke="${colour}" stroke-width="1.5"/>`;
  }
}
