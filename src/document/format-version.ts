/**
 * The format name and version at the top of every budget file, and the
 * migration of older versions to the current one. A migration is a plain
 * function from one version's JSON to the next; the chain runs before schema
 * validation, so the schema only ever describes the current version.
 */
import { BudgetFileError } from './budget-file-error';
import { FORMAT_NAME, FORMAT_VERSION } from './budget-document';

/** One step of the chain: turns a version `from` document into a version `from + 1` one. */
export interface Migration {
  from: number;
  /** What changed, in one sentence, for the note shown to the user. */
  note: string;
  /** Returns the migrated JSON; `formatVersion` is set by the caller. Throws nothing for a valid input of version `from`. */
  migrate(raw: Record<string, unknown>): Record<string, unknown>;
}

/** Migrations by the version they start from. */
export type MigrationRegistry = ReadonlyMap<number, Migration>;

/**
 * Version 1 to 2: version 1 knew only the planar model, so a version 1
 * budget is a planar budget; it gains `"model": "planar"` and nothing else
 * changes (test/document/format-migration.test.ts runs every example both ways).
 */
const PLANAR_MODEL_NAMED: Migration = {
  from: 1,
  note: 'the budget now names its error model ("model": "planar"); nothing else changed',
  migrate: (raw) => ({ ...raw, model: 'planar' }),
};

/** The project's migrations, by the version they start from. */
export const MIGRATIONS: MigrationRegistry = new Map([[1, PLANAR_MODEL_NAMED]]);

/** A document brought to the current version, with a note per migration applied. */
export interface MigratedJson {
  raw: Record<string, unknown>;
  notes: string[];
}

/** The root object, its format name checked. @throws BudgetFileError otherwise. */
function requireBudgetRoot(value: unknown, fileName: string): Record<string, unknown> {
  if (value === null || typeof value !== 'object' || Array.isArray(value)) {
    throw new BudgetFileError(fileName, '', `must be a JSON object starting with "format": "${FORMAT_NAME}"`);
  }
  const raw = value as Record<string, unknown>;
  if (raw.format !== FORMAT_NAME) {
    const got = raw.format === undefined ? 'is missing' : `is ${JSON.stringify(raw.format)}`;
    throw new BudgetFileError(fileName, 'format', `${got}; a Sigma Ledger budget has "format": "${FORMAT_NAME}"`);
  }
  return raw;
}

/** The stated version. @throws BudgetFileError when it is missing, not a whole number, or newer than `current`. */
function requireReadableVersion(raw: Record<string, unknown>, fileName: string, current: number): number {
  const version = raw.formatVersion;
  if (version === undefined) {
    throw new BudgetFileError(fileName, 'formatVersion', `is missing; a budget states its format version, e.g. "formatVersion": ${current}`);
  }
  if (typeof version !== 'number' || !Number.isInteger(version) || version < 0) {
    throw new BudgetFileError(fileName, 'formatVersion', `must be a whole number such as ${current}, got ${JSON.stringify(version)}`);
  }
  if (version > current) {
    throw new BudgetFileError(fileName, 'formatVersion', `this file is format version ${version}; this tool reads up to version ${current} — update Sigma Ledger`);
  }
  return version;
}

/**
 * Checks the format header of a parsed budget and migrates it to `current`.
 * @param registry migrations by starting version (tests pass their own).
 * @throws BudgetFileError naming `format` or `formatVersion` for a file that
 *   is not a budget, states a newer version, or an older one with no
 *   migration path.
 */
export function migrateToCurrent(
  value: unknown, fileName: string, registry: MigrationRegistry = MIGRATIONS, current: number = FORMAT_VERSION,
): MigratedJson {
  let raw = requireBudgetRoot(value, fileName);
  const notes: string[] = [];
  for (let version = requireReadableVersion(raw, fileName, current); version < current; version++) {
    const step = registry.get(version);
    if (!step) {
      throw new BudgetFileError(fileName, 'formatVersion', `this file is format version ${version}, which this tool can no longer read (no migration to version ${version + 1}); open it with an older Sigma Ledger and save it again`);
    }
    raw = { ...step.migrate(raw), formatVersion: version + 1 };
    notes.push(`Migrated from format version ${version} to ${version + 1}: ${step.note}`);
  }
  return { raw, notes };
}
