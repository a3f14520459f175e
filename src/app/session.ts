import { useAppStore } from '../store/useAppStore';
import { DocumentSession } from './documentSession';

/** The tab's document session, over the app's store and the browser's IndexedDB. */
export const documentSession = new DocumentSession(useAppStore);
