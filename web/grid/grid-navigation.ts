/**
 * Where the active cell of a grid goes for a key: rows of cells where some
 * columns may be missing in some rows. Pure, so it is tested without a page.
 */

/** A cell of the grid by row and column index. */
export interface GridPosition {
  row: number;
  col: number;
}

/** A step of the active cell: arrows, Tab forward and back, row ends, grid ends. */
export type GridMove = 'up' | 'down' | 'left' | 'right' | 'next' | 'previous' | 'home' | 'end' | 'first' | 'last' | 'none';

/** The present column nearest to `col` in `row`, looking left first. */
function nearestColumn(row: boolean[], col: number): number {
  for (let c = Math.min(col, row.length - 1); c >= 0; c--) if (row[c]) return c;
  return row.findIndex(Boolean);
}

function stepInRow(row: boolean[], col: number, delta: number): number | undefined {
  for (let c = col + delta; c >= 0 && c < row.length; c += delta) if (row[c]) return c;
  return undefined;
}

/** Forward or back through cells in reading order; undefined past either end. */
function tabStep(present: boolean[][], pos: GridPosition, delta: 1 | -1): GridPosition | undefined {
  const inRow = stepInRow(present[pos.row], pos.col, delta);
  if (inRow !== undefined) return { row: pos.row, col: inRow };
  const row = pos.row + delta;
  if (row < 0 || row >= present.length) return undefined;
  const cols = present[row];
  const col = delta > 0 ? cols.findIndex(Boolean) : cols.lastIndexOf(true);
  return { row, col };
}

/**
 * The position after `move` from `pos` in a grid whose `present[r][c]` says
 * which cells exist. Arrows stop at the edges; Tab (`next`, `previous`)
 * wraps to the next row and returns undefined past the grid's ends, so
 * focus may leave the grid. Throws nothing.
 */
export function moveInGrid(present: boolean[][], pos: GridPosition, move: GridMove): GridPosition | undefined {
  if (present.length === 0) return undefined;
  const clampRow = (r: number) => Math.max(0, Math.min(present.length - 1, r));
  const inRow = (r: number, c: number) => ({ row: r, col: nearestColumn(present[r], c) });
  switch (move) {
    case 'up': return inRow(clampRow(pos.row - 1), pos.col);
    case 'down': return inRow(clampRow(pos.row + 1), pos.col);
    case 'left': return { row: pos.row, col: stepInRow(present[pos.row], pos.col, -1) ?? pos.col };
    case 'right': return { row: pos.row, col: stepInRow(present[pos.row], pos.col, 1) ?? pos.col };
    case 'next': return tabStep(present, pos, 1);
    case 'previous': return tabStep(present, pos, -1);
    case 'home': return { row: pos.row, col: present[pos.row].findIndex(Boolean) };
    case 'end': return { row: pos.row, col: present[pos.row].lastIndexOf(true) };
    case 'first': return inRow(0, pos.col);
    case 'last': return inRow(present.length - 1, pos.col);
    default: return inRow(clampRow(pos.row), pos.col);
  }
}

/** The move a key asks for in a grid, or undefined for keys the grid leaves alone. Throws nothing. */
export function keyMove(e: Pick<KeyboardEvent, 'key' | 'shiftKey' | 'ctrlKey' | 'metaKey' | 'altKey'>): GridMove | undefined {
  const ctrl = e.ctrlKey || e.metaKey;
  if (e.altKey) return undefined;
  switch (e.key) {
    case 'ArrowUp': return 'up';
    case 'ArrowDown': return 'down';
    case 'ArrowLeft': return 'left';
    case 'ArrowRight': return 'right';
    case 'Tab': return e.shiftKey ? 'previous' : 'next';
    case 'Home': return ctrl ? 'first' : 'home';
    case 'End': return ctrl ? 'last' : 'end';
    default: return undefined;
  }
}
