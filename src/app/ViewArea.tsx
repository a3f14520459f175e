import { lazy, Suspense, type ReactNode } from 'react';
import { switchVariant } from '../commands/switchVariant';
import { activeVariantId, variantEntries } from '../model/variants';
import { useAppStore } from '../store/useAppStore';
import { useExploreStore } from '../store/useExploreStore';
import type { MainView } from '../store/exploreStore';
import '../panels/explore.css';

// The explorer (with d3 and its charts) and the variants table load when first opened, so the first
// load carries only the floorplan editor.
const ExplorerView = lazy(() =>
  import('../panels/explorer/ExplorerView').then((m) => ({ default: m.ExplorerView })),
);
const VariantsView = lazy(() =>
  import('../panels/variants/VariantsView').then((m) => ({ default: m.VariantsView })),
);

const VIEWS: readonly { id: MainView; label: string }[] = [
  { id: 'floorplan', label: 'Floorplan' },
  { id: 'explorer', label: 'Explorer' },
  { id: 'variants', label: 'Variants' },
];

/**
 * The main area: a bar to choose the floorplan, the design-space explorer or the variants table, and
 * which variant is being edited; below it the chosen view. The floorplan is passed in as children.
 */
export function ViewArea({ children }: { readonly children: ReactNode }) {
  const view = useExploreStore((s) => s.view);
  const setView = useExploreStore((s) => s.setView);
  const design = useAppStore((s) => s.history.present);
  const execute = useAppStore((s) => s.execute);
  const requestFit = useAppStore((s) => s.requestFit);
  const variants = variantEntries(design);
  return (
    <div className="view-area">
      <nav className="view-bar" aria-label="Views">
        <div className="view-tabs" role="tablist">
          {VIEWS.map((v) => (
            <button
              key={v.id}
              type="button"
              role="tab"
              aria-selected={view === v.id}
              data-testid={`view-${v.id}`}
              onClick={() => setView(v.id)}
            >
              {v.label}
              {v.id === 'variants' && <span className="badge">{variants.length}</span>}
            </button>
          ))}
        </div>
        <label className="variant-switcher">
          Variant
          <select
            data-testid="variant-switcher"
            value={activeVariantId(design)}
            onChange={(e) => {
              if (execute(switchVariant, { variantId: e.target.value })) requestFit();
            }}
          >
            {variants.map((v) => (
              <option key={v.id} value={v.id}>
                {v.name}
              </option>
            ))}
          </select>
        </label>
      </nav>
      <div className="view-body">
        {view === 'floorplan' && children}
        <Suspense fallback={<p className="view-loading">Loading…</p>}>
          {view === 'explorer' && <ExplorerView />}
          {view === 'variants' && <VariantsView />}
        </Suspense>
      </div>
    </div>
  );
}
