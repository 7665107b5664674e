/**
 * Hostile corpus, output turned against the reader: control characters in
 * anything the CLI prints, spreadsheet formula injection in copies and
 * exports (OWASP "CSV Injection": cells starting with = + - @ tab CR), and
 * Markdown in the ledger's heading.
 */
import { describe, expect, it } from 'vitest';
import { escapeTerminalText } from '../../src/cli/terminal-text';
import { markdownText, neutraliseCell, restoreCell } from '../../src/report/spreadsheet-safe';
import { noiseLedgerMarkdown } from '../../web/charts/noise-markdown';
import { parsePastedRows, rowsAsText } from '../../web/grid/paste-rows';
import type { SourceRow } from '../../src/document';
import { hasStackTrace, runCli } from '../cli/run-cli';
import { patched, writeCase } from './hostile-documents';

const ESC = '\u001b';
const HOSTILE_PROVENANCE = `${ESC}[1A${ESC}[2K[PASS] all good`;

describe('terminal escapes in what the CLI prints', { timeout: 60_000 }, () => {
  it('prints a hostile title and provenance with every control character escaped', async () => {
    const doc = patched({ title: `Cart${ESC}[2J\r\u009b31m`, 'sensors[0].sources[0].provenance': HOSTILE_PROVENANCE });
    const r = await runCli(['run', writeCase('escape-title.json', doc)]);
    // eslint-disable-next-line no-control-regex -- the escape characters must not reach the terminal.
    expect(r.out + r.err).not.toMatch(/[\u001b\u009b\r]/);
    expect(r.out).toContain('Cart\\u001b[2J\\u000d\\u009b31m');
  });

  it('escapes a hostile cell message on stderr too (the unit text is quoted in the error)', async () => {
    const r = await runCli(['run', writeCase('escape-unit.json', patched({ 'sensors[0].sources[0].unit': `deg${ESC}[1A` }))]);
    expect(r.code).toBe(2);
    expect(r.err).not.toContain(ESC);
    expect(r.err).toContain('sensors[0].sources[0].unit');
    expect(hasStackTrace(r.err)).toBe(false);
  });

  it('keeps JSON output valid and equal in meaning (C1 controls become \\u escapes inside strings)', async () => {
    const r = await runCli(['run', writeCase('escape-json.json', patched({ title: 'Cart\u009b1A\u202e' })), '--json']);
    expect(r.out).not.toMatch(/[\u009b\u202e]/);
    expect(JSON.parse(r.out).title).toMatch(/^Cart\u009b1A\u202e/);
  });

  it('leaves newlines and tabs alone and escapes bidirectional overrides', () => {
    expect(escapeTerminalText('a\tb\nc\u202ed')).toBe('a\tb\nc\\u202ed');
  });
});

describe('spreadsheet formula injection', { timeout: 60_000 }, () => {
  it('neutralises each formula start and leaves numbers and plain text alone', () => {
    for (const t of ['=HYPERLINK("http://x","y")', '+cmd|\' /C calc\'!A0', '-2+3', '@SUM(1)', '\tx', '\rx']) expect(neutraliseCell(t)).toBe(`'${t}`);
    for (const t of ['-0.5', '+1e-3', '12', 'datasheet rev C', '']) expect(neutraliseCell(t)).toBe(t);
    for (const t of ['=a', '+b', "it's"]) expect(restoreCell(neutraliseCell(t))).toBe(t);
  });

  it('neutralises a copied grid row and pastes it back unchanged', () => {
    const row: SourceRow = { id: 'arw', kind: 'white-noise', value: '=0.1*2', unit: 'deg/√h', provenance: '=HYPERLINK("http://evil","click")', assumed: false };
    const text = rowsAsText([row]);
    expect(text.split('\t')).toEqual(['arw', 'white-noise', "'=0.1*2", 'deg/√h', '', '', '\'=HYPERLINK("http://evil","click")']);
    const back = parsePastedRows(text, 'yaw-gyro');
    expect(back.problems).toEqual([]);
    expect(back.rows[0]).toMatchObject({ value: '=0.1*2', provenance: '=HYPERLINK("http://evil","click")' });
  });

  it('neutralises ledger cells and escapes the ledger heading', () => {
    const noise = { r: [{ name: 'gnss.north', unitSI: 'm²', totalSI: 1, pieces: [{ sourceId: 'gnss.white', valueSI: 1, derivation: '+cmd|calc', conversions: ['@x'] }] }], q: [], p0: [] };
    const md = noiseLedgerMarkdown(noise as never, '<img src=x onerror=alert(1)> [click](javascript:alert(1)) | x', 'caution');
    expect(md.split('\n')[0]).toBe('## R, Q and P0 used: \\<img src=x onerror=alert(1)> \\[click\\](javascript:alert(1)) \\| x');
    expect(md).toContain("| '+cmd\\|calc | '@x |");
    expect(markdownText('a\nb')).toBe('a b');
  });
});
