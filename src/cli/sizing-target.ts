import { InputError } from '../errors';
import { sizableRowIds, type SizableInput } from '../budget/sizing';

/**
 * Checks `size`'s --vary and --requirement against the budget before any run.
 * @throws InputError at --vary listing every row that can be varied, or at
 *   --requirement listing the budget's requirements.
 */
export function checkSizingTarget(input: SizableInput, rowId: string, requirementId: string | undefined): void {
  const rows = sizableRowIds(input);
  if (!rows.includes(rowId)) {
    throw new InputError('--vary', `no row "${rowId}"; give it as sensorId.rowId, one of: ${rows.join(', ')}`);
  }
  const ids = (input.requirements ?? []).map((r) => r.id);
  if (requirementId !== undefined && !ids.includes(requirementId)) {
    throw new InputError('--requirement', `no requirement "${requirementId}"; the file has ${ids.join(', ') || 'none'}`);
  }
}
