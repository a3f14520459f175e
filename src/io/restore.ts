import { DESIGN_FORMAT, DESIGN_VERSION, type Design } from '../model/design';
import { designSchema } from '../model/designSchema';
import { MAX_DESIGN_TEXT_LENGTH } from './designText';
import { MIGRATIONS } from './migrations';
import { formatWholeNumber } from '../model/units';

export { MAX_DESIGN_TEXT_LENGTH } from './designText';

/** What a restore gives back: the design, or every problem found with where it is. */
export type RestoreResult =
  | { readonly ok: true; readonly design: Design; readonly migratedFrom: number | null }
  | { readonly ok: false; readonly errors: readonly string[] };

function fail(...errors: string[]): RestoreResult {
  return { ok: false, errors };
}

/** A zod issue path as restore messages write it: `blocks[3].cellsPerBitline`. */
export function formatPath(path: readonly PropertyKey[]): string {
  let text = '';
  for (const key of path) {
    text += typeof key === 'number' ? `[${key}]` : `${text ? '.' : ''}${String(key)}`;
  }
  return text || '(design)';
}

/**
 * A short description of an unexpected value for a message. JSON.stringify is not used on arbitrary
 * values because it throws on BigInt and cyclic objects, and a restore must never throw.
 */
function describeFound(value: unknown): string {
  if (value === undefined) return 'nothing';
  if (typeof value === 'string') {
    // Long strings are cut so that a message stays one readable line (40 characters is arbitrary).
    return JSON.stringify(value.length > 40 ? `${value.slice(0, 40)}…` : value);
  }
  if (value === null || typeof value === 'number' || typeof value === 'boolean') return String(value);
  return Array.isArray(value) ? 'an array' : `a value of type ${typeof value}`;
}

/**
 * The single entry point for every load: file open, autosave, paste and the CLI. Parses text (if given
 * text), checks the format name, migrates older versions, and validates with the zod schema.
 * Never throws; on failure returns messages naming what is wrong and where.
 */
export function restoreDesign(input: unknown): RestoreResult {
  let data = input;
  if (typeof input === 'string') {
    if (input.length > MAX_DESIGN_TEXT_LENGTH) {
      return fail(
        `file is ${formatWholeNumber(input.length)} characters; the limit is ${formatWholeNumber(MAX_DESIGN_TEXT_LENGTH)}`,
      );
    }
    try {
      data = JSON.parse(input);
    } catch (error) {
      return fail(`not valid JSON: ${error instanceof Error ? error.message : String(error)}`);
    }
  }
  if (typeof data !== 'object' || data === null || Array.isArray(data)) {
    return fail('not a Matloom design: expected a JSON object');
  }
  let record = data as Record<string, unknown>;
  if (record.format !== DESIGN_FORMAT) {
    return fail(
      `not a Matloom design: "format" must be "${DESIGN_FORMAT}", found ${describeFound(record.format)}`,
    );
  }
  const version = record.version;
  if (typeof version !== 'number' || !Number.isInteger(version) || version < 1) {
    return fail(`"version" must be a whole number from 1 to ${DESIGN_VERSION}`);
  }
  if (version > DESIGN_VERSION) {
    return fail(
      `design format version ${version} is newer than this Matloom understands (${DESIGN_VERSION})`,
    );
  }
  for (let v = version; v < DESIGN_VERSION; v++) {
    const migrate = MIGRATIONS[v];
    if (!migrate) return fail(`no migration from design format version ${v}`);
    record = migrate(record);
  }
  const parsed = designSchema.safeParse(record);
  if (!parsed.success) {
    return fail(
      ...parsed.error.issues.slice(0, 20).map((issue) => `${formatPath(issue.path)}: ${issue.message}`),
    );
  }
  return { ok: true, design: parsed.data, migratedFrom: version === DESIGN_VERSION ? null : version };
}
