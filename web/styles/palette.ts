/**
 * Series colours for charts. The eight colours of Okabe & Ito's palette
 * ("Color Universal Design", 2008), chosen because they stay distinct under
 * the common colour-vision deficiencies (checked by simulation in
 * test/web-palette.test.ts); black is kept for totals. Charts with more
 * sources than colours group the smallest as "other sources".
 */
export const SERIES_COLOURS = ['#0072B2', '#E69F00', '#009E73', '#CC79A7', '#56B4E9', '#D55E00', '#F0E442'] as const;

/** Colour of totals and of the requirement limit lines. */
export const TOTAL_COLOUR = '#1b1f24';
/**
 * Colour of "other sources". A light grey: the mid grey #8c8c8c it replaced
 * came within ΔE 8.5 of #CC79A7 under simulated deuteranopia (see
 * test/web-palette.test.ts).
 */
export const NEUTRAL_COLOUR = '#c4c4c4';
/** Fill of outage bands on time plots. */
export const OUTAGE_FILL = 'rgba(140, 140, 140, 0.18)';
/** Edges and labels of outage bands, drawn over the data. */
export const OUTAGE_INK = '#4a5561';
/** Dash pattern of requirement limit lines, in CSS pixels (on, off). */
export const LIMIT_DASH = [6, 4];

/** The colour of the i-th series (wrapping after the palette ends). */
export function seriesColour(i: number): string {
  return SERIES_COLOURS[i % SERIES_COLOURS.length];
}
