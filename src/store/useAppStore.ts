import { demoDesign } from '../designs/demoDesign';
import { createAppStore } from './appStore';

/**
 * The app's one store. It holds the demo until the document session (app/documentSession.ts) opens the
 * tab's first document, before anything is shown. Tests make their own with createAppStore.
 */
export const useAppStore = createAppStore(demoDesign());
