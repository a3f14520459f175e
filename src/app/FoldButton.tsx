/**
 * The button that folds a side panel away and shows it again: its words say what it does to `what` ("the
 * panels", "the block list"), and aria-expanded says whether that is open. Test ids `collapse-<name>` and
 * `expand-<name>`.
 */
export function FoldButton({
  name,
  what,
  folded,
  symbol,
  onToggle,
}: {
  readonly name: string;
  readonly what: string;
  readonly folded: boolean;
  /** The glyph on the button, pointing where the panel goes. */
  readonly symbol: string;
  readonly onToggle: (folded: boolean) => void;
}) {
  const words = folded ? `Show ${what}` : `Fold ${what} away`;
  return (
    <button
      type="button"
      className="fold-button"
      data-testid={`${folded ? 'expand' : 'collapse'}-${name}`}
      title={words}
      aria-label={words}
      aria-expanded={!folded}
      onClick={() => onToggle(!folded)}
    >
      {symbol}
    </button>
  );
}
