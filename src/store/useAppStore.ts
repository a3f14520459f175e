import { loadAutosave, type AutosaveLoad } from '../io/autosave';
import { demoDesign } from '../model/demoDesign';
import { createAppStore } from './appStore';

/** What the autosave held when the page opened (browser storage; none outside a browser). */
function readAutosave(): AutosaveLoad {
  try {
    return typeof localStorage === 'undefined' ? { kind: 'none' } : loadAutosave(localStorage);
  } catch {
    return { kind: 'none' };
  }
}

const initial = readAutosave();

/**
 * The app's one store. It opens on the autosaved design when there is one, else on the built-in demo.
 * Tests make their own with createAppStore.
 */
export const useAppStore = createAppStore(initial.kind === 'restored' ? initial.design : demoDesign());

if (initial.kind === 'quarantined')
  useAppStore.getState().setNotice({ kind: 'error', text: initial.message });
