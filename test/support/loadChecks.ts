import { loadChecks } from '../../src/io/checksOnDemand';
import { loadEditPath } from '../../src/store/editPathOnDemand';

// The app loads restore and the edit check after its first paint (src/main.tsx); every test starts with
// them loaded, so a store refuses a bad edit at once, as the app does once they have arrived.
await loadChecks();
// Likewise the engine's edit path: store edits take the incremental path, as in the app after its first paint.
await loadEditPath();
