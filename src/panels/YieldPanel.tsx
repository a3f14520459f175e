import { useEffect, useMemo, useState } from 'react';
import { setRepairSetting } from '../commands/setRepairSetting';
import { explainTotal, repairSettingsOf, TOTAL_FIGURE_PANEL, yieldFiguresOf } from '../engine';
import { REPAIR_FIELDS } from '../model/fieldCatalog';
import { REPAIR_DOMAIN_LABEL, REPAIR_DOMAINS, type RepairDomainKind } from '../model/repair';
import { formatQuantity, formatWholeNumber } from '../model/units';
import { useRepairStore } from '../store/repairStore';
import { useAppStore } from '../store/useAppStore';
import { FigureRow } from './FigureRow';
import { QuantityField } from './QuantityField';
import { SelectField, type SelectOption } from './SelectField';
import { useRunCommand } from './useRunCommand';

const DOMAIN_OPTIONS: readonly SelectOption<RepairDomainKind>[] = REPAIR_DOMAINS.map((value) => ({
  value,
  label: REPAIR_DOMAIN_LABEL[value],
}));

const YIELD_KEYS = TOTAL_FIGURE_PANEL.find((g) => g.title === 'Yield')?.keys ?? [];

/** Trials of the automatic Monte-Carlo run after each edit, and of a refining run on request. */
const AUTO_TRIALS = 10_000;
const MORE_TRIALS = 100_000;

/**
 * Defects, redundancy and wafer: the yield inputs, the yield figures with their explanations, and the
 * Monte-Carlo die-yield estimate that solves each die's spare allocation exactly; it reruns in a worker
 * after every edit (debounced; the last estimate is marked stale until the new one arrives).
 */
export function YieldPanel() {
  const design = useAppStore((s) => s.history.present);
  const report = useAppStore((s) => s.report);
  const run = useRunCommand();
  const settings = repairSettingsOf(design);
  const figures = useMemo(() => yieldFiguresOf(report, design), [report, design]);
  const [openKey, setOpenKey] = useState<string | null>(null);
  const mc = useRepairStore((s) => s.run);
  const startMc = useRepairStore((s) => s.start);
  const scheduleMc = useRepairStore((s) => s.schedule);
  const cancelMc = useRepairStore((s) => s.cancel);
  const request = figures.monteCarlo;
  useEffect(() => {
    if (request) scheduleMc(request, AUTO_TRIALS);
  }, [request, scheduleMc]);
  const stale = mc.result !== null && mc.resultRequest !== request;
  const busy = mc.status === 'running' || mc.status === 'waiting';
  const result = mc.result;

  return (
    <section className="panel" aria-labelledby="yield-heading" data-testid="yield-panel">
      <h2 id="yield-heading">Yield and redundancy</h2>
      <div className="fields">
        {REPAIR_FIELDS.map((f) => (
          <QuantityField
            key={f.key}
            id={`repair-${f.key}`}
            label={f.label}
            quantity={f.quantity}
            value={settings[f.key]}
            onCommit={(value) => run(setRepairSetting, { field: f.key, value })}
          />
        ))}
        <SelectField
          id="repair-domain"
          label="Row-repair domain (spare rows shared by)"
          options={DOMAIN_OPTIONS}
          value={settings.repairDomain}
          onChange={(value) => run(setRepairSetting, { field: 'repairDomain', value })}
        />
      </div>
      {figures.problems.map((p) => (
        <p key={p} className="hint" role="alert">
          {p}
        </p>
      ))}
      <div className="figures" data-testid="yield-figures">
        {YIELD_KEYS.map((key) => {
          const explanation = explainTotal(key, report, design);
          return explanation ? (
            <FigureRow
              key={key}
              testId={`total-${key}`}
              explanation={explanation}
              open={openKey === key}
              onToggle={() => setOpenKey((k) => (k === key ? null : key))}
            />
          ) : null;
        })}
      </div>
      <p className="hint" data-testid="repair-closed-form-kind">
        {figures.repairProbabilityIsExact
          ? 'The repair probability and die yield above are exact for this model: only whole word lines and bit-line pairs fail (or there are no spares), and rows and columns are repaired independently.'
          : 'The repair probability and die yield above are a LOWER BOUND: single faulty cells may take a spare row or a spare column, which couples row domains and strips, so the closed form counts only the best of three repair plans fixed in advance. The Monte-Carlo estimate below solves every die exactly and is the figure to read.'}
      </p>
      <div className="figure-group" data-testid="repair-monte-carlo">
        <h4>Die yield by Monte Carlo</h4>
        <p className="hint">
          Reruns in the background after each edit: throws each die&apos;s faults{' '}
          {formatWholeNumber(AUTO_TRIALS)} times on the same row domains and strips, solves every die&apos;s
          spare allocation exactly (must-repair, then a bounded search), periphery defects included.
        </p>
        <p data-testid="repair-mc-status" aria-live="polite">
          {mc.status === 'waiting' && 'Waiting for the edits to settle…'}
          {mc.status === 'running' &&
            `Running: ${formatWholeNumber(result && !stale ? result.trials : 0)} of ${formatWholeNumber(mc.trials)} trials…`}
          {mc.status === 'idle' && result && 'Stopped.'}
        </p>
        {result && (
          <p data-testid="repair-mc-result" className={stale ? 'stale' : undefined}>
            {stale ? 'Stale (for the design before the last edit): ' : 'Estimate: '}
            {formatQuantity(result.estimate, 'percent')} (95 % interval{' '}
            {formatQuantity(result.low, 'percent')} – {formatQuantity(result.high, 'percent')}) over{' '}
            {formatWholeNumber(result.trials)} trials
            {result.undecided > 0 ? `, ${result.undecided} undecided (counted as not repaired)` : ''}
            {mc.elapsed !== null && !busy ? ` in ${formatQuantity(mc.elapsed, 'time')}` : ''}
          </p>
        )}
        <div className="button-row">
          <button
            type="button"
            data-testid="repair-mc-run"
            title={`Estimate again with ${formatWholeNumber(MORE_TRIALS)} trials for a narrower interval`}
            disabled={!request || busy}
            onClick={() => request && startMc(request, MORE_TRIALS)}
          >
            {`Refine: ${formatWholeNumber(MORE_TRIALS)} trials`}
          </button>
          <button
            type="button"
            data-testid="repair-mc-stop"
            title="Stop the running estimate (the last result stays)"
            disabled={!busy}
            onClick={cancelMc}
          >
            Stop
          </button>
        </div>
        {mc.error && <p role="alert">{mc.error}</p>}
      </div>
      <p className="hint">
        First-order estimates: silicon decisions need measured defect densities, retention data and the
        foundry&apos;s redundancy rules.
      </p>
    </section>
  );
}
