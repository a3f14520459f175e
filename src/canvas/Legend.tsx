import { BLOCK_TYPE_LABEL, type BlockType } from '../model/block';
import { BLOCK_STYLE, ERROR_STROKE, WARNING_STROKE } from './blockStyle';

const ORDER: readonly BlockType[] = ['mat', 'senseAmpStrip', 'wordlineDriverStrip', 'rowDecoder', 'spacer'];

/** Key to the block colours, drawn over the canvas corner. */
export function Legend() {
  return (
    <ul className="legend" aria-label="Legend">
      {ORDER.map((type) => (
        <li key={type}>
          <span
            className="swatch"
            style={{ background: BLOCK_STYLE[type].fill, borderColor: BLOCK_STYLE[type].stroke }}
          />
          {type === 'rowDecoder' ? 'decoder' : BLOCK_TYPE_LABEL[type]}
        </li>
      ))}
      <li>
        <span
          className="swatch"
          style={{ background: 'rgba(198, 40, 40, 0.16)', borderColor: ERROR_STROKE, borderWidth: 2 }}
        />
        failing check
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
