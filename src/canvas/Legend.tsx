import { BLOCK_TYPE_LABEL, type BlockType } from '../model/block';
import { BLOCK_STYLE, ERROR_STROKE, WARNING_STROKE } from './blockStyle';

const ORDER: readonly BlockType[] = ['mat', 'senseAmpStrip', 'wordlineDriverStrip', 'rowDecoder', 'spacer'];
const SHORT: Partial<Record<BlockType, string>> = {
  senseAmpStrip: 'SA strip',
  wordlineDriverStrip: 'SWD strip',
  rowDecoder: 'decoder',
};

/** Key to the block colours and check markers, one line in the status bar. */
export function Legend() {
  return (
    <ul className="status-legend" aria-label="Legend">
      {ORDER.map((type) => (
        <li key={type} title={BLOCK_TYPE_LABEL[type]}>
          <span
            className="swatch"
            style={{ background: BLOCK_STYLE[type].fill, borderColor: BLOCK_STYLE[type].stroke }}
          />
          {SHORT[type] ?? BLOCK_TYPE_LABEL[type]}
        </li>
      ))}
      <li>
        <span
          className="swatch"
          style={{ background: 'rgba(198, 40, 40, 0.16)', borderColor: ERROR_STROKE, borderWidth: 2 }}
        />
        error
      </li>
      <li>
        <span
          className="swatch"
          style={{ background: 'rgba(201, 133, 0, 0.16)', borderColor: WARNING_STROKE, borderWidth: 2 }}
        />
        warning
      </li>
    </ul>
  );
}
