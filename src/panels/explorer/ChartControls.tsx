import { AXIS_FIGURES, FIGURE_INFO, type AxisFigure } from '../../explore/figures';
import { useExploreStore } from '../../store/useExploreStore';
import { QuantityField } from '../QuantityField';

/** Which figures go on the axes, and the limits that shade infeasible points. */
export function ChartControls({ minMargin }: { readonly minMargin: number }) {
  const xAxis = useExploreStore((s) => s.xAxis);
  const yAxis = useExploreStore((s) => s.yAxis);
  const maxDelay = useExploreStore((s) => s.constraints.maxDelay);
  const setAxes = useExploreStore((s) => s.setAxes);
  const setConstraints = useExploreStore((s) => s.setConstraints);
  const axisSelect = (id: string, label: string, value: AxisFigure, pick: (a: AxisFigure) => void) => (
    <div className="field">
      <label htmlFor={id}>{label}</label>
      <select id={id} data-testid={id} value={value} onChange={(e) => pick(e.target.value as AxisFigure)}>
        {AXIS_FIGURES.map((key) => (
          <option key={key} value={key}>
            {FIGURE_INFO[key].label}
          </option>
        ))}
      </select>
    </div>
  );
  return (
    <section className="panel" aria-labelledby="chart-heading">
      <h2 id="chart-heading">Chart</h2>
      {axisSelect('x-axis', 'Horizontal', xAxis, (a) => setAxes({ xAxis: a }))}
      {axisSelect('y-axis', 'Vertical', yAxis, (a) => setAxes({ yAxis: a }))}
      <QuantityField
        id="constraint-min-margin"
        label="Minimum margin"
        quantity="voltage"
        value={minMargin}
        onCommit={(v) => {
          if (!Number.isFinite(v) || Math.abs(v) > 10) return 'a margin between −10 V and 10 V';
          setConstraints({ minMargin: v });
          return null;
        }}
      />
      <QuantityField
        id="constraint-max-delay"
        label="Maximum word-line delay"
        quantity="time"
        value={maxDelay}
        onCommit={(v) => {
          if (!(v > 0) || v > 1) return 'a delay above zero and at most 1 s';
          setConstraints({ maxDelay: v });
          return null;
        }}
      />
      <p className="hint">
        Points that miss a limit or fail a check are grey; the front joins the best feasible ones.
      </p>
    </section>
  );
}
