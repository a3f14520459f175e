import { useState } from 'react';
import { buildPartition } from '../../designs/buildPartition';
import { formatBits } from '../../model/units';
import { createVariant } from '../../commands/createVariant';
import { processChoices, type SweepSettings } from '../../explore/sweepSettings';
import { CELL_KIND_LABEL, CELL_KINDS, type BitlineArchitecture, type CellKind } from '../../model/cell';
import type { Design } from '../../model/design';
import { useAppStore } from '../../store/useAppStore';
import { QuantityField } from '../QuantityField';
import { SelectField } from '../SelectField';

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
  const architectures = (['folded', 'open', 'paired'] as const).filter((a) =>
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
      <SelectField<CellKind>
        id="build-kind"
        label="Cell kind"
        value={kind}
        options={kinds.map((k) => ({ value: k, label: CELL_KIND_LABEL[k] }))}
        onChange={setKind}
      />
      <SelectField<BitlineArchitecture>
        id="build-architecture"
        label="Bit lines"
        value={architecture ?? null}
        options={architectures.map((a) => ({ value: a, label: a }))}
        onChange={setArchitecture}
      />
      <SelectField
        id="build-cell"
        label="Cell"
        value={cell?.id ?? null}
        options={cells.map((c) => ({ value: c.id, label: c.name }))}
        onChange={setCell}
      />
      <SelectField
        id="build-process"
        label="Process"
        value={processId}
        options={choices.map((c) => ({ value: c.id, label: c.label }))}
        onChange={setProcessId}
      />
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
        <button
          type="button"
          data-testid="build-partition"
          title="Build this partition as a new variant and edit it"
          onClick={build}
          disabled={!cell || !process}
        >
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
