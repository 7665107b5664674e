import type { Px } from './plan-geometry';

/** Width of one character of the plan's 11 px labels, px (a little more than the font's average, to be safe). */
export const CHAR_PX = 7.5;
/** Vertical distance between two stacked labels, px. */
const LINE_PX = 18;

/** Where one outage's label goes: its text position, the point on the track it names, and its text anchor. */
export interface PlacedLabel {
  text: string;
  at: Px;
  label: Px;
  anchor: 'start' | 'end';
}

/**
 * Outage labels beside the track, never over it or each other: they are
 * stacked in a column in the wider free margin (right or left of everything
 * drawn), in the order of their points' heights, each with a leader line to
 * its point. Returns undefined when neither margin is wide enough; the caller
 * then numbers the points and lists the labels under the drawing.
 * @param drawn every point drawn (track and landmarks), to find the free margins.
 */
export function placeOutageLabels(
  items: { text: string; at: Px }[],
  drawn: Px[],
  width: number,
  height: number,
): PlacedLabel[] | undefined {
  if (items.length === 0) return [];
  const xs = drawn.map((p) => p.x);
  const left = Math.min(...xs),
    right = Math.max(...xs);
  const needPx = Math.max(...items.map((i) => i.text.length)) * CHAR_PX + 14;
  const roomRight = width - right - 6,
    roomLeft = left - 6;
  if (Math.max(roomRight, roomLeft) < needPx) return undefined;
  const onRight = roomRight >= roomLeft;
  const x = onRight ? right + 12 : left - 12;
  const order = items.map((_, i) => i).sort((a, b) => items[a].at.y - items[b].at.y);
  const top = 14,
    bottom = height - 30;
  const ys: number[] = [];
  for (const i of order) ys.push(Math.max(items[i].at.y + 4, (ys[ys.length - 1] ?? -Infinity) + LINE_PX, top));
  // Too low: move the whole stack up, keeping its spacing.
  const over = (ys[ys.length - 1] ?? 0) - bottom;
  for (let k = 0; k < ys.length && over > 0; k++) ys[k] = Math.max(top + k * LINE_PX, ys[k] - over);
  const placed: PlacedLabel[] = new Array(items.length);
  order.forEach(
    (i, k) =>
      (placed[i] = { text: items[i].text, at: items[i].at, label: { x, y: ys[k] }, anchor: onRight ? 'start' : 'end' }),
  );
  return placed;
}
