import { useState } from 'react';
import { buildPartition } from '../../build/buildPartition';
import { formatBits } from '../../model/units';
import { createVariant } from '../../commands/createVariant';
import { processChoices, type SweepSettings } from '../../explore/sweepSettings';
import { CELL_KIND_LABEL, CELL_KINDS, type BitlineArchitecture, type CellKind } from '../../model/cell';
import type { Design } from '../../model/design';
import { useAppStore } from '../../store/useAppStore';
import { QuantityField } from '../QuantityField';

interface Props {
  readonly design: Design;
  readonly settings: SweepSettings;
  /** Called with the new variant's name once it is built. */
  onBuilt(name: string): void;
}

/**
 * Builds one partition as a new variant: cell kind and bit-line architecture narrow the cells of the
 * active design's library, then the process, the cell counts, and the bank's capacity and strips.
 */
export function BuilderForm({ design, settings, onBuilt }: Props) {
  const execute = useAppStore((s) => s.execute);
  const kinds = CELL_KINDS.filter((k) => design.cells.some((c) => c.kind === k));
  const [kind, setKind] = useState<CellKind>(kinds[0] ?? 'dram-1t1c');
  const architectures = (['folded', 'open'] as const).filter((a) =>
    design.cells.some((c) => c.kind === kind && c.bitlineArchitecture === a),
  );
  const [architectureChoice, setArchitecture] = useState<BitlineArchitecture>('folded');
  const architecture = architectures.includes(architectureChoice) ? architectureChoice : architectures[0];
  const cells = design.cells.filter((c) => c.kind === kind && c.bitlineArchitecture === architecture);
  const [cellChoice, setCell] = useState<string>('');
  const cell = cells.find((c) => c.id === cellChoice) ?? cells[0];
  const choices = processChoices(design);
  const [processId, setProcessId] = useState<string>(choices[0]?.id ?? '');
  const process = (choices.find((c) => c.id === processId) ?? choices[0])?.process;
  const [cellsPerBitline, setBl] = useState(512);
  const [cellsPerWordline, setWl] = useState(1024);
  const [error, setError] = useState<string | null>(null);

  const build = () => {
    if (!cell || !process) return;
    const built = buildPartition({
      targetBits: settings.targetBits,
      cell,
      process,
      operating: design.operating,
      cellsPerBitline,
      cellsPerWordline,
      strips: settings.strips,
      cells: design.cells,
    });
    if (!built.ok) {
      setError(built.error);
      return;
    }
    if (execute(createVariant, { design: built.design })) {
      setError(null);
      onBuilt(built.design.name);
    } else {
      setError(useAppStore.getState().lastError);
    }
  };
  const whole = (v: number) =>
    Number.isInteger(v) && v >= 1 && v <= 16384 ? null : 'a whole number from 1 to 16,384';

  return (
    <section className="panel" aria-labelledby="builder-heading">
      <h2 id="builder-heading">Build one partition</h2>
      <div className="field">
        <label htmlFor="build-kind">Cell kind</label>
        <select
          id="build-kind"
          data-testid="build-kind"
          value={kind}
          onChange={(e) => setKind(e.target.value as CellKind)}
        >
          {kinds.map((k) => (
            <option key={k} value={k}>
              {CELL_KIND_LABEL[k]}
            </option>
          ))}
        </select>
      </div>
      <div className="field">
        <label htmlFor="build-architecture">Bit lines</label>
        <select
          id="build-architecture"
          data-testid="build-architecture"
          value={architecture}
          onChange={(e) => setArchitecture(e.target.value as BitlineArchitecture)}
        >
          {architectures.map((a) => (
            <option key={a} value={a}>
              {a}
            </option>
          ))}
        </select>
      </div>
      <div className="field">
        <label htmlFor="build-cell">Cell</label>
        <select
          id="build-cell"
          data-testid="build-cell"
          value={cell?.id ?? ''}
          onChange={(e) => setCell(e.target.value)}
        >
          {cells.map((c) => (
            <option key={c.id} value={c.id}>
              {c.name}
            </option>
          ))}
        </select>
      </div>
      <div className="field">
        <label htmlFor="build-process">Process</label>
        <select
          id="build-process"
          data-testid="build-process"
          value={processId}
          onChange={(e) => setProcessId(e.target.value)}
        >
          {choices.map((c) => (
            <option key={c.id} value={c.id}>
              {c.label}
            </option>
          ))}
        </select>
      </div>
      <QuantityField
        id="build-cells-per-bitline"
        label="Cells per bit line"
        quantity="count"
        value={cellsPerBitline}
        onCommit={(v) => whole(v) ?? (setBl(v), null)}
      />
      <QuantityField
        id="build-cells-per-wordline"
        label="Cells per word line"
        quantity="count"
        value={cellsPerWordline}
        onCommit={(v) => whole(v) ?? (setWl(v), null)}
      />
      <div className="panel-actions">
        <button type="button" data-testid="build-partition" onClick={build} disabled={!cell || !process}>
          Build {formatBits(settings.targetBits)} bank as a variant
        </button>
      </div>
      {error && (
        <p className="field-error" role="alert">
          {error}
        </p>
      )}
      <p className="hint">Capacity and strip sizes come from the Bank section above.</p>
    </section>
  );
}
