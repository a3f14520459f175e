import { LEGEND_ROWS } from './blockStyle';

/** Key to the block colours and check markers, one line in the status bar. */
export function Legend() {
  return (
    <ul className="status-legend" aria-label="Legend">
      {LEGEND_ROWS.map((row) => (
        <li key={row.label} title={row.title}>
          <span
            className="swatch"
            style={{ background: row.fill, borderColor: row.stroke, borderWidth: row.marker ? 2 : undefined }}
          />
          {row.label}
        </li>
      ))}
    </ul>
  );
}
