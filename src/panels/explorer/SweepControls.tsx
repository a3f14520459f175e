import type { StripSizes } from '../../designs/partitionPlan';
import { formatBits, formatWholeNumber } from '../../model/units';
import {
  MAX_SWEEP_POINTS,
  SWEEP_POINT_LIMIT_REASON,
  sweepSize,
  type SweepRequest,
} from '../../explore/sweep';
import {
  DEFAULT_SPARE_SWEEP,
  processChoices,
  sweepRequestFor,
  TARGET_CAPACITIES,
  type SweepSettings,
} from '../../explore/sweepSettings';
import type { Design } from '../../model/design';
import { formatQuantity } from '../../model/units';
import { SweepTable } from '../../explore/sweepColumns';
import { useExploreStore } from '../../store/useExploreStore';
import { QuantityField } from '../QuantityField';
import { RangeField } from './RangeField';
import { seriesColour } from './seriesStyle';
import { SelectField } from '../SelectField';

const STRIP_FIELDS: readonly { key: keyof StripSizes; label: string; optional: boolean }[] = [
  { key: 'senseAmpStripHeight', label: 'Sense-amp strip height', optional: false },
  { key: 'wordlineDriverStripWidth', label: 'Driver strip width', optional: false },
  { key: 'rowDecoderWidth', label: 'Row decoder width', optional: true },
  { key: 'columnDecoderHeight', label: 'Column decoder height', optional: true },
];

interface Props {
  readonly design: Design;
  readonly settings: SweepSettings;
  onChange(settings: SweepSettings): void;
}

/** The bank every point is built as (capacity, periphery) and the ranges and sets to sweep. */
export function BankControls({ settings, onChange }: Omit<Props, 'design'>) {
  return (
    <section className="panel" aria-labelledby="bank-heading">
      <h2 id="bank-heading">Bank</h2>
      <SelectField
        id="target-capacity"
        label="Capacity"
        value={String(settings.targetBits)}
        options={TARGET_CAPACITIES.map((bits) => ({ value: String(bits), label: formatBits(bits) }))}
        onChange={(bits) => onChange({ ...settings, targetBits: Number(bits) })}
      />
      {STRIP_FIELDS.map((f) => (
        <QuantityField
          key={f.key}
          id={`strip-${f.key}`}
          label={f.label}
          quantity="length"
          value={settings.strips[f.key]}
          onCommit={(value) => {
            if (!(value > 0 || (f.optional && value === 0)) || value > 1e-3) {
              return f.optional ? 'between 0 (none) and 1 mm' : 'above zero and at most 1 mm';
            }
            onChange({ ...settings, strips: { ...settings.strips, [f.key]: value } });
            return null;
          }}
        />
      ))}
    </section>
  );
}

/**
 * Run, or Cancel while a sweep runs. Its own component: it follows the sweep's status, so starting and
 * ending a sweep re-render this button and not the settings around it.
 */
function RunButton({ request, size }: { readonly request: SweepRequest; readonly size: number }) {
  // The status only: the run object changes with every chart update while a sweep runs.
  const status = useExploreStore((s) => s.run.status);
  const startSweep = useExploreStore((s) => s.startSweep);
  const cancelSweep = useExploreStore((s) => s.cancelSweep);
  return status === 'running' ? (
    <button
      type="button"
      className="primary"
      data-testid="cancel-sweep"
      title="Stop the sweep; the points so far stay"
      onClick={cancelSweep}
    >
      Cancel
    </button>
  ) : (
    <button
      type="button"
      className="primary"
      data-testid="run-sweep"
      disabled={size === 0 || size > MAX_SWEEP_POINTS}
      onClick={() => startSweep(request, new SweepTable(), size)}
      title={
        size > MAX_SWEEP_POINTS
          ? `at most ${formatWholeNumber(MAX_SWEEP_POINTS)} points`
          : 'Assess every partition of the sweep and chart it'
      }
    >
      Run sweep
    </button>
  );
}

export function SweepControls({ design, settings, onChange }: Props) {
  const request = sweepRequestFor(settings, design);
  const size = sweepSize(request);
  const toggle = (list: readonly string[], id: string, on: boolean) =>
    on ? [...list.filter((x) => x !== id), id] : list.filter((x) => x !== id);
  const choices = processChoices(design);

  return (
    <section className="panel" aria-labelledby="sweep-heading">
      <h2 id="sweep-heading">Sweep</h2>
      <RangeField
        id="sweep-bl"
        label="Cells per bit line"
        value={settings.cellsPerBitline}
        onCommit={(cellsPerBitline) => onChange({ ...settings, cellsPerBitline })}
      />
      <RangeField
        id="sweep-wl"
        label="Cells per word line"
        value={settings.cellsPerWordline}
        onCommit={(cellsPerWordline) => onChange({ ...settings, cellsPerWordline })}
      />
      <fieldset className="checklist">
        <legend>Cells</legend>
        {design.cells.map((c) => {
          const on = settings.cellIds.includes(c.id);
          const colourIndex = request.cells.findIndex((rc) => rc.id === c.id);
          return (
            <label key={c.id}>
              <input
                type="checkbox"
                checked={on}
                data-testid={`sweep-cell-${c.id}`}
                onChange={(e) =>
                  onChange({ ...settings, cellIds: toggle(settings.cellIds, c.id, e.target.checked) })
                }
              />
              <span
                className="swatch-dot"
                style={{ background: on ? seriesColour(colourIndex) : '#c9ccd1' }}
              />
              {c.name}
            </label>
          );
        })}
      </fieldset>
      <fieldset className="checklist">
        <legend>Processes</legend>
        {choices.map((c) => (
          <label key={c.id}>
            <input
              type="checkbox"
              checked={settings.processIds.includes(c.id)}
              data-testid={`sweep-process-${c.id}`}
              onChange={(e) =>
                onChange({ ...settings, processIds: toggle(settings.processIds, c.id, e.target.checked) })
              }
            />
            {c.label}
          </label>
        ))}
      </fieldset>
      <fieldset className="checklist">
        <legend>Yield</legend>
        <label>
          <input
            type="checkbox"
            checked={settings.spares !== null}
            data-testid="sweep-spares"
            onChange={(e) => onChange({ ...settings, spares: e.target.checked ? DEFAULT_SPARE_SWEEP : null })}
          />
          Sweep spare rows and columns (die yield, good dies per wafer; about 1 ms a point)
        </label>
        {settings.spares && (
          <>
            <RangeField
              id="sweep-spare-rows"
              label="Spare rows per row domain"
              min={0}
              max={256}
              value={settings.spares.rows}
              onCommit={(rows) =>
                settings.spares && onChange({ ...settings, spares: { ...settings.spares, rows } })
              }
            />
            <RangeField
              id="sweep-spare-columns"
              label="Spare columns per strip segment"
              min={0}
              max={256}
              value={settings.spares.columns}
              onCommit={(columns) =>
                settings.spares && onChange({ ...settings, spares: { ...settings.spares, columns } })
              }
            />
          </>
        )}
      </fieldset>
      <p className="hint">
        Operating conditions come from the active design:{' '}
        {formatQuantity(design.operating.temperature, 'temperature')}, refresh window{' '}
        {formatQuantity(design.operating.refreshWindow, 'time')} (Process tab).
      </p>
      <div className="sweep-run">
        <span data-testid="sweep-size">{formatWholeNumber(size)} points</span>
        <RunButton request={request} size={size} />
      </div>
      <p className="hint" data-testid="sweep-limit">
        At most {formatWholeNumber(MAX_SWEEP_POINTS)} points a sweep: {SWEEP_POINT_LIMIT_REASON}.
      </p>
    </section>
  );
}
