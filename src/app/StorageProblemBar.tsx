import { useAppStore } from '../store/useAppStore';
import { saveDesignFile } from './designFiles';

/**
 * A lasting warning when the browser would not keep the design: it stays until the design is saved to
 * a file (the button does that), because until then a closed tab loses the work.
 */
export function StorageProblemBar() {
  const problem = useAppStore((s) => s.storageProblem);
  if (!problem) return null;
  return (
    <div className="notice error storage-problem" role="alert" data-testid="storage-problem">
      <span>{problem}</span>
      <button type="button" data-testid="storage-problem-save" onClick={() => void saveDesignFile()}>
        Save to a file
      </button>
    </div>
  );
}
