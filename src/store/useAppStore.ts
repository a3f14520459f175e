import { createAppStore } from './appStore';

/** The app's one store, starting on the built-in demo design. Tests make their own with createAppStore. */
export const useAppStore = createAppStore();
