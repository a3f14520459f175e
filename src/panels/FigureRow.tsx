import type { Explanation } from '../engine';
import { formatQuantity } from '../model/units';

interface FigureRowProps {
  readonly testId: string;
  readonly explanation: Explanation;
  readonly open: boolean;
  onToggle(): void;
}

/** One figure: label and value; clicking it opens how it was computed. */
export function FigureRow({ testId, explanation, open, onToggle }: FigureRowProps) {
  return (
    <>
      <button
        type="button"
        className={`figure-row${open ? ' open' : ''}`}
        data-testid={testId}
        aria-expanded={open}
        onClick={onToggle}
        title="Show formula, inputs and source"
      >
        <span className="figure-label">{explanation.title}</span>
        <span className="figure-value" data-testid={`${testId}-value`}>
          {formatQuantity(explanation.value, explanation.quantity)}
        </span>
        {explanation.missingReason && (
          <span className="figure-missing" data-testid={`${testId}-missing`}>
            {explanation.missingReason}
          </span>
        )}
      </button>
      {open && <ExplanationCard explanation={explanation} />}
    </>
  );
}

/** Formula, inputs with their values, the result and the source of the method. */
export function ExplanationCard({ explanation }: { readonly explanation: Explanation }) {
  return (
    <div className="explanation" role="note" data-testid="explanation">
      <div className="formula">{explanation.formula}</div>
      <table>
        <tbody>
          {explanation.inputs.map((i) => (
            <tr key={i.symbol}>
              <td className="symbol">{i.symbol}</td>
              <td>{i.label}</td>
              <td className="num">{formatQuantity(i.value, i.quantity)}</td>
            </tr>
          ))}
          <tr className="result">
            <td className="symbol">{explanation.symbol}</td>
            <td>result</td>
            <td className="num">{formatQuantity(explanation.value, explanation.quantity)}</td>
          </tr>
        </tbody>
      </table>
      {explanation.missingReason && <p className="method">Does not exist: {explanation.missingReason}.</p>}
      <p className="method">{explanation.method}</p>
      <p className="source">Source: {explanation.source}</p>
    </div>
  );
}
