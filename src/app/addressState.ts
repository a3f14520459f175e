import type { MainView } from '../store/exploreStore';

/**
 * What the page address keeps of the session, so that Back and reload behave: the view shown
 * (`view=explorer`; the floorplan is the default and is left out) and the selected blocks (`select=<id>`,
 * once per block), which are selected and framed again on load. Other parameters (`blank`, `generate`,
 * `perf`) are left as they are.
 */
export interface AddressState {
  readonly view: MainView;
  readonly select: readonly string[];
}

const VIEWS: readonly MainView[] = ['floorplan', 'explorer', 'variants'];
/** A larger selection is not written to the address (the address would grow past what browsers keep). */
export const MAX_ADDRESS_SELECTION = 100;

export function readAddressState(search: string): AddressState {
  const params = new URLSearchParams(search);
  const view = VIEWS.find((v) => v === params.get('view')) ?? 'floorplan';
  return { view, select: params.getAll('select').filter((id) => id.length > 0) };
}

/** The address query with the session's view and selection written in; other parameters kept. */
export function writeAddressState(search: string, state: AddressState): string {
  const params = new URLSearchParams(search);
  params.delete('view');
  params.delete('select');
  if (state.view !== 'floorplan') params.set('view', state.view);
  if (state.select.length <= MAX_ADDRESS_SELECTION)
    for (const id of state.select) params.append('select', id);
  const text = params.toString().replace(/=(?=&|$)/g, '');
  return text ? `?${text}` : '';
}
