/**
 * Reads the tables of a review report's HTML back into cells (the report's
 * own markup: `<table id=…>`, one `<td>` per cell, full-precision numbers
 * in `data-value`). Not a test file.
 */

/** One cell: its text as shown, and its full value when it is a number. */
export interface ParsedCell {
  text: string;
  value?: number;
}

const decode = (s: string) => s.replace(/&lt;/g, '<').replace(/&gt;/g, '>').replace(/&quot;/g, '"').replace(/&#39;/g, "'").replace(/&amp;/g, '&');

/** The body rows of every table with an id, by id. */
export function reportTables(html: string): Map<string, ParsedCell[][]> {
  const tables = new Map<string, ParsedCell[][]>();
  for (const m of html.matchAll(/<table id="([^"]+)">([\s\S]*?)<\/table>/g)) {
    const body = m[2].slice(m[2].indexOf('<tbody>'));
    const rows = [...body.matchAll(/<tr>([\s\S]*?)<\/tr>/g)].map((r) =>
      [...r[1].matchAll(/<td([^>]*)>([\s\S]*?)<\/td>/g)].map((c) => {
        const value = /data-value="([^"]+)"/.exec(c[1]);
        return { text: decode(c[2]), ...(value && { value: Number(value[1]) }) };
      }));
    tables.set(decode(m[1]), rows);
  }
  return tables;
}

/** The table `id`, or a failed expectation naming it. */
export function table(tables: Map<string, ParsedCell[][]>, id: string): ParsedCell[][] {
  const t = tables.get(id);
  if (!t) throw new Error(`the report has no table "${id}" (it has ${[...tables.keys()].join(', ')})`);
  return t;
}
