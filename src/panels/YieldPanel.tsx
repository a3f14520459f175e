import { useMemo, useState } from 'react';
import { setRepairSetting } from '../commands/setRepairSetting';
import { explainTotal, repairSettingsOf, TOTAL_FIGURE_PANEL, yieldFiguresOf } from '../engine';
import { REPAIR_FIELDS } from '../model/fieldCatalog';
import { REPAIR_DOMAIN_LABEL, REPAIR_DOMAINS, type RepairDomainKind } from '../model/repair';
import { formatQuantity } from '../model/units';
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

/** Trials of one Monte-Carlo run. */
const TRIALS = 10_000;

/**
 * Defects, redundancy and wafer: the yield inputs, the yield figures with their explanations, and a
 * Monte-Carlo repair estimate that solves each faulty domain's spare allocation exactly.
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
  const stale = mc.request !== null && mc.request !== figures.monteCarlo;
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
      <div className="figure-group" data-testid="repair-monte-carlo">
        <h4>Monte-Carlo repair check</h4>
        <p className="hint">
          Throws each die&apos;s faults {TRIALS.toLocaleString('en-US')} times and solves every faulty
          domain&apos;s spare allocation exactly (must-repair, then a bounded search); periphery defects
          included.
        </p>
        <button
          type="button"
          data-testid="repair-mc-run"
          disabled={mc.status === 'running'}
          onClick={() => figures.monteCarlo && startMc(figures.monteCarlo, TRIALS)}
        >
          {mc.status === 'running' ? 'Running…' : 'Estimate die yield by Monte Carlo'}
        </button>
        {result && (
          <p data-testid="repair-mc-result">
            {formatQuantity(result.estimate, 'percent')} (95 % interval{' '}
            {formatQuantity(result.low, 'percent')} – {formatQuantity(result.high, 'percent')}) over{' '}
            {result.trials.toLocaleString('en-US')} trials
            {result.undecided > 0 ? `, ${result.undecided} undecided` : ''}
            {mc.elapsed !== null ? ` in ${formatQuantity(mc.elapsed, 'time')}` : ''}
            {stale ? ' — for the design before the last edit' : ''}
          </p>
        )}
        {mc.error && <p role="alert">{mc.error}</p>}
      </div>
      <p className="hint">
        First-order estimates: silicon decisions need measured defect densities, retention data and the
        foundry&apos;s redundancy rules.
      </p>
    </section>
  );
}
