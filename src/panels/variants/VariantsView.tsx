import { useState } from 'react';
import { shortProcessName } from '../../designs/buildPartition';
import { deleteVariant } from '../../commands/deleteVariant';
import { duplicateVariant } from '../../commands/duplicateVariant';
import { renameVariant } from '../../commands/renameVariant';
import { switchVariant } from '../../commands/switchVariant';
import {
  bankFigureEntry,
  bankMissingReason,
  explainFigure,
  figuresFromReport,
  TABLE_FIGURES,
  type FigureKey,
  type PartitionFigures,
} from '../../engine';
import { isMat } from '../../model/block';
import type { VariantDesign } from '../../model/design';
import { hasRoomForVariant, variantEntries } from '../../model/variants';
import { MAT_SIZE_UNIT } from '../../model/matSize';
import { formatQuantity } from '../../model/units';
import { useAppStore } from '../../store/useAppStore';
import { ExplanationCard } from '../FigureRow';
import { useRunCommand } from '../useRunCommand';
import { deltaLine, MATS_PER, PER_BIT_FIGURES, verdictOf } from './comparison';
import { variantReport } from './variantReports';

/** What a variant is made of, in words: its cells and cell counts ("mixed" when mats differ). */
function describe(design: VariantDesign) {
  const mats = design.blocks.filter(isMat);
  const names = [...new Set(mats.map((m) => design.cells.find((c) => c.id === m.cellId)?.name ?? m.cellId))];
  const counts = [...new Set(mats.map((m) => `${m.cellsPerBitline} × ${m.cellsPerWordline}`))];
  return {
    cells: names.length === 0 ? '—' : names.length === 1 ? names[0] : `${names.length} cells (mixed)`,
    counts: counts.length === 0 ? '—' : counts.length === 1 ? counts[0] : 'mixed',
    process: shortProcessName(design.process),
  };
}

/** Relative difference beyond rounding noise. */
function differs(a: number, b: number): boolean {
  if (Number.isNaN(a) || Number.isNaN(b)) return Number.isNaN(a) !== Number.isNaN(b);
  return Math.abs(a - b) > 1e-9 * Math.max(Math.abs(a), Math.abs(b));
}

/** A figure as the table shows it: divided by usable bits when "per bit" is on and the figure grows with size. */
function shown(key: FigureKey, figures: PartitionFigures, perBit: boolean): number {
  const value = figures[key];
  if (!perBit || !PER_BIT_FIGURES.has(key)) return value;
  const per = key === 'matCount' ? MATS_PER : 1;
  return figures.usableBits > 0 ? (value * per) / figures.usableBits : Number.NaN;
}

/**
 * The variants of the document side by side: one column per variant, one row per figure, each value
 * compared with the active variant's (green better, red worse). Rename in place; switch, duplicate and
 * delete are undoable commands. Click a value for its formula, inputs and source.
 */
export function VariantsView() {
  const design = useAppStore((s) => s.history.present);
  const activeReport = useAppStore((s) => s.report);
  const requestFit = useAppStore((s) => s.requestFit);
  const run = useRunCommand();
  const [open, setOpen] = useState<{ id: string; key: FigureKey } | null>(null);
  const [error, setError] = useState<string | null>(null);
  const [renaming, setRenaming] = useState<string | null>(null);
  const [perBit, setPerBit] = useState(false);
  const entries = variantEntries(design);
  const columns = entries.map((v) => {
    const report = v.active ? activeReport : variantReport(v.design);
    const errors = report.findings.filter((f) => f.severity === 'error').length;
    return {
      ...v,
      figures: figuresFromReport(report, v.design),
      errors,
      warnings: report.findings.length - errors,
      about: describe(v.design),
    };
  });
  const reference = columns.find((c) => c.active) ?? columns[0];
  const act = (error: string | null) => setError(error);
  const openColumn = open ? columns.find((c) => c.id === open.id) : undefined;

  return (
    <div className="variants-view" data-testid="variants-view">
      <p className="hint">
        Each variant is a whole design; the one being edited is marked. Values are compared with it: ↑ or ↓
        and the change in per cent, green and “better” or red and “worse”. A variant without usable bits is
        not compared. Click a value for how it was computed.
      </p>
      <label className="check-field">
        <input
          type="checkbox"
          data-testid="variants-per-bit"
          checked={perBit}
          onChange={(e) => setPerBit(e.target.checked)}
        />{' '}
        Per bit: divide the figures that grow with size (area, mats, refresh power, redundancy area) by usable
        bits, so variants of different capacity compare fairly
      </label>
      <div className="table-scroll">
        <table className="variants-table" data-testid="variants-table">
          <thead>
            <tr>
              <th scope="col" className="row-head">
                Variant
              </th>
              {columns.map((c) => (
                <th
                  key={c.id}
                  scope="col"
                  className={c.active ? 'active' : ''}
                  data-testid={`variant-col-${c.id}`}
                >
                  <VariantName
                    id={c.id}
                    name={c.name}
                    renaming={renaming === c.id}
                    onRename={(name) => {
                      const refused = run(renameVariant, { variantId: c.id, name });
                      act(refused);
                      if (!refused) setRenaming(null);
                    }}
                    onCancel={() => setRenaming(null)}
                  />
                  <div className="variant-actions">
                    {c.active ? (
                      <span className="active-badge" data-testid={`active-${c.id}`}>
                        editing
                      </span>
                    ) : (
                      <button
                        type="button"
                        data-testid={`switch-${c.id}`}
                        title="Edit this variant on the floorplan"
                        onClick={() => {
                          const refused = run(switchVariant, { variantId: c.id });
                          act(refused);
                          if (!refused) requestFit();
                        }}
                      >
                        Switch to
                      </button>
                    )}
                    <button
                      type="button"
                      data-testid={`rename-${c.id}`}
                      title="Rename this variant"
                      onClick={() => setRenaming(c.id)}
                    >
                      Rename
                    </button>
                    <button
                      type="button"
                      data-testid={`duplicate-${c.id}`}
                      title="Copy this variant as a new one"
                      disabled={!hasRoomForVariant(design)}
                      onClick={() => act(run(duplicateVariant, { variantId: c.id }))}
                    >
                      Duplicate
                    </button>
                    <button
                      type="button"
                      data-testid={`delete-${c.id}`}
                      title="Delete this variant (undoable)"
                      disabled={columns.length === 1}
                      onClick={() => act(run(deleteVariant, { variantId: c.id }))}
                    >
                      Delete
                    </button>
                  </div>
                </th>
              ))}
            </tr>
          </thead>
          <tbody>
            {(['cells', 'counts', 'process'] as const).map((key) => {
              const values = columns.map((c) => c.about[key]);
              const anyDiff = values.some((v) => v !== reference?.about[key]);
              return (
                <tr key={key} className={anyDiff ? 'differs' : ''}>
                  <th scope="row" className="row-head">
                    {key === 'cells' ? 'Cell' : key === 'counts' ? `Size (${MAT_SIZE_UNIT})` : 'Process'}
                  </th>
                  {columns.map((c) => (
                    <td
                      key={c.id}
                      className={`${c.active ? 'active' : ''} ${c.about[key] !== reference?.about[key] ? 'changed' : ''}`}
                      data-testid={`variant-${c.id}-${key}`}
                    >
                      {c.about[key]}
                    </td>
                  ))}
                </tr>
              );
            })}
            {TABLE_FIGURES.map((key) => {
              const info = bankFigureEntry(key);
              const normalised = perBit && PER_BIT_FIGURES.has(key);
              const ref = reference ? shown(key, reference.figures, perBit) : Number.NaN;
              const refComparable = (reference?.figures.usableBits ?? 0) > 0;
              const anyDiff = columns.some((c) => differs(shown(key, c.figures, perBit), ref));
              return (
                <tr key={key} className={anyDiff ? 'differs' : ''}>
                  <th scope="row" className="row-head">
                    {normalised ? `${info.label} per ${key === 'matCount' ? 'Mib' : 'bit'}` : info.label}
                  </th>
                  {columns.map((c) => {
                    const value = shown(key, c.figures, perBit);
                    const comparable = refComparable && c.figures.usableBits > 0;
                    const changed = !c.active && differs(value, ref);
                    const better = normalised ? (PER_BIT_FIGURES.get(key) ?? info.better) : info.better;
                    const verdict = changed ? verdictOf(better, value, ref, comparable) : 'none';
                    const quantity = normalised && info.quantity === 'count' ? 'ratio' : info.quantity;
                    return (
                      <td
                        key={c.id}
                        className={`num ${c.active ? 'active' : ''} ${verdict === 'none' ? '' : verdict}`}
                      >
                        <button
                          type="button"
                          className="value"
                          data-testid={`variant-${c.id}-${key}`}
                          title="Show formula, inputs and source"
                          onClick={() =>
                            setOpen(open?.id === c.id && open.key === key ? null : { id: c.id, key })
                          }
                        >
                          {Number.isFinite(value) ? formatQuantity(value, quantity) : '—'}
                        </button>
                        {!Number.isFinite(value) && (
                          <span className="figure-missing" data-testid={`variant-${c.id}-${key}-missing`}>
                            {bankMissingReason(key, c.figures)}
                          </span>
                        )}
                        {verdict !== 'none' && (
                          <span className="delta" data-testid={`variant-${c.id}-${key}-delta`}>
                            {deltaLine(value, ref, verdict)}
                          </span>
                        )}
                      </td>
                    );
                  })}
                </tr>
              );
            })}
            <tr className={columns.some((c) => c.errors !== reference?.errors) ? 'differs' : ''}>
              <th scope="row" className="row-head">
                Checks
              </th>
              {columns.map((c) => (
                <td
                  key={c.id}
                  className={`${c.active ? 'active' : ''} ${c.errors > 0 ? 'worse' : ''}`}
                  data-testid={`variant-${c.id}-checks`}
                >
                  {c.errors === 0 ? 'no errors' : `${c.errors} errors`}
                  {c.warnings > 0 ? `, ${c.warnings} warnings` : ''}
                </td>
              ))}
            </tr>
          </tbody>
        </table>
      </div>
      {error && (
        <p className="field-error" role="alert">
          {error}
        </p>
      )}
      {open && openColumn && (
        <div className="variant-explanation">
          <h3>
            {openColumn.name}: {bankFigureEntry(open.key).label}
          </h3>
          <ExplanationCard
            explanation={explainFigure(open.key, openColumn.figures, {
              featureSize: openColumn.design.process.featureSize,
              wordlineDriverResistance: openColumn.design.process.wordlineDriverResistance,
              refreshWindow: openColumn.design.operating.refreshWindow,
            })}
          />
        </div>
      )}
    </div>
  );
}

/** A variant's name; while renaming, an input that commits on Enter or blur and cancels on Escape. */
function VariantName(props: {
  id: string;
  name: string;
  renaming: boolean;
  onRename(name: string): void;
  onCancel(): void;
}) {
  const { id, name, renaming, onRename, onCancel } = props;
  const [text, setText] = useState(name);
  if (!renaming) {
    return (
      <div className="variant-title" data-testid={`variant-title-${id}`}>
        {name}
      </div>
    );
  }
  const commit = () => (text === name ? onCancel() : onRename(text));
  return (
    <input
      className="variant-name"
      data-testid={`variant-name-${id}`}
      aria-label="Variant name"
      // Focus follows the Rename button the person just pressed.
      autoFocus
      value={text}
      onChange={(e) => setText(e.target.value)}
      onBlur={commit}
      onKeyDown={(e) => {
        if (e.key === 'Enter') commit();
        if (e.key === 'Escape') onCancel();
      }}
    />
  );
}
