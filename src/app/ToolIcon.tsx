import { BLOCK_STYLE } from '../canvas/blockStyle';
import type { Tool } from '../commands/tools';

/** Small drawings for the palette, in the block colours. */
export function ToolIcon({ tool }: { readonly tool: Tool }) {
  const s = (type: keyof typeof BLOCK_STYLE) => BLOCK_STYLE[type];
  switch (tool) {
    case 'select':
      return (
        <svg viewBox="0 0 20 20" aria-hidden="true">
          <path d="M5 3 L5 16 L8.5 12.5 L11 18 L13 17 L10.5 11.5 L15 11.5 Z" fill="#23313f" />
        </svg>
      );
    case 'pan':
      return (
        <svg viewBox="0 0 20 20" aria-hidden="true">
          <path
            d="M10 2 L13 5 H11 V9 H15 V7 L18 10 L15 13 V11 H11 V15 H13 L10 18 L7 15 H9 V11 H5 V13 L2 10 L5 7 V9 H9 V5 H7 Z"
            fill="#23313f"
          />
        </svg>
      );
    case 'mat':
      return (
        <svg viewBox="0 0 20 20" aria-hidden="true">
          <rect x="3" y="3" width="14" height="14" fill={s('mat').fill} stroke={s('mat').stroke} />
          <path
            d="M7.7 3 V17 M12.3 3 V17 M3 7.7 H17 M3 12.3 H17"
            stroke={s('mat').stroke}
            strokeWidth="0.8"
          />
        </svg>
      );
    case 'senseAmpStrip':
      return (
        <svg viewBox="0 0 20 20" aria-hidden="true">
          <rect
            x="2"
            y="7"
            width="16"
            height="6"
            fill={s('senseAmpStrip').fill}
            stroke={s('senseAmpStrip').stroke}
          />
          <path d="M6 8.5 L6 11.5 L9 10 Z M11 8.5 L11 11.5 L14 10 Z" fill={s('senseAmpStrip').stroke} />
        </svg>
      );
    case 'wordlineDriverStrip':
      return (
        <svg viewBox="0 0 20 20" aria-hidden="true">
          <rect
            x="7"
            y="2"
            width="6"
            height="16"
            fill={s('wordlineDriverStrip').fill}
            stroke={s('wordlineDriverStrip').stroke}
          />
          <path d="M8.5 6 H11.5 M8.5 10 H11.5 M8.5 14 H11.5" stroke={s('wordlineDriverStrip').stroke} />
        </svg>
      );
    case 'rowDecoder':
      return (
        <svg viewBox="0 0 20 20" aria-hidden="true">
          <rect
            x="5"
            y="2"
            width="10"
            height="16"
            fill={s('rowDecoder').fill}
            stroke={s('rowDecoder').stroke}
          />
          <path d="M7 5 H13 M7 8 H13 M7 11 H13 M7 14 H13" stroke={s('rowDecoder').stroke} strokeWidth="0.8" />
        </svg>
      );
    case 'columnDecoder':
      return (
        <svg viewBox="0 0 20 20" aria-hidden="true">
          <rect
            x="2"
            y="5"
            width="16"
            height="10"
            fill={s('columnDecoder').fill}
            stroke={s('columnDecoder').stroke}
          />
          <path
            d="M5 7 V13 M8 7 V13 M11 7 V13 M14 7 V13"
            stroke={s('columnDecoder').stroke}
            strokeWidth="0.8"
          />
        </svg>
      );
    case 'spacer':
      return (
        <svg viewBox="0 0 20 20" aria-hidden="true">
          <rect
            x="4"
            y="4"
            width="12"
            height="12"
            fill={s('spacer').fill}
            stroke={s('spacer').stroke}
            strokeDasharray="2 1.5"
          />
        </svg>
      );
  }
}
