import { AXIS_FIGURES, bankFigureEntry } from '../../engine';
import { useExploreStore } from '../../store/useExploreStore';
import { QuantityField } from '../QuantityField';
import { SelectField } from '../SelectField';

/** Which figures go on the axes, and the limits that shade infeasible points. */
export function ChartControls({ minMargin }: { readonly minMargin: number }) {
  const xAxis = useExploreStore((s) => s.xAxis);
  const yAxis = useExploreStore((s) => s.yAxis);
  const maxDelay = useExploreStore((s) => s.constraints.maxDelay);
  const setAxes = useExploreStore((s) => s.setAxes);
  const setConstraints = useExploreStore((s) => s.setConstraints);
  const options = AXIS_FIGURES.map((key) => ({ value: key, label: bankFigureEntry(key).label }));
  return (
    <section className="panel" aria-labelledby="chart-heading">
      <h2 id="chart-heading">Chart</h2>
      <SelectField
        id="x-axis"
        label="Horizontal"
        value={xAxis}
        options={options}
        onChange={(a) => setAxes({ xAxis: a })}
      />
      <SelectField
        id="y-axis"
        label="Vertical"
        value={yAxis}
        options={options}
        onChange={(a) => setAxes({ yAxis: a })}
      />
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
