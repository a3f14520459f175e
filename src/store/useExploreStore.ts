import { createExploreStore } from './exploreStore';

/** The app's explorer session store. Tests make their own with createExploreStore. */
export const useExploreStore = createExploreStore();
