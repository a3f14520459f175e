import { lazy, Suspense, type ReactNode } from 'react';
import { switchVariant } from '../commands/switchVariant';
import { activeVariantId, variantEntries } from '../model/variants';
import { useAppStore } from '../store/useAppStore';
import { useExploreStore } from '../store/useExploreStore';
import type { MainView } from '../store/exploreStore';
import { TabBar, TabPanels, type TabSpec } from './a11y/TabBar';
import '../panels/explore.css';

// The explorer (with d3 and its charts) and the variants table load when first opened, so the first
// load carries only the floorplan editor.
const ExplorerView = lazy(() =>
  import('../panels/explorer/ExplorerView').then((m) => ({ default: m.ExplorerView })),
);
const VariantsView = lazy(() =>
  import('../panels/variants/VariantsView').then((m) => ({ default: m.VariantsView })),
);

const VIEW_TITLES: Record<MainView, { label: string; title: string }> = {
  floorplan: { label: 'Floorplan', title: 'The floorplan editor: draw and place blocks' },
  explorer: { label: 'Explorer', title: 'Sweep partitions and compare them on a chart' },
  variants: { label: 'Variants', title: 'The variants of this design side by side' },
};
const VIEW_ORDER: readonly MainView[] = ['floorplan', 'explorer', 'variants'];

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
  const tabs: TabSpec<MainView>[] = VIEW_ORDER.map((id) => ({
    id,
    title: VIEW_TITLES[id].title,
    testId: `view-${id}`,
    label: (
      <>
        {VIEW_TITLES[id].label}
        {id === 'variants' && (
          <span className="badge" aria-label={`(${variants.length})`}>
            {variants.length}
          </span>
        )}
      </>
    ),
  }));
  return (
    <div className="view-area">
      <nav className="view-bar" aria-label="Views">
        <TabBar
          tabs={tabs}
          selected={view}
          idPrefix="view"
          label="Views"
          className="view-tabs"
          onSelect={setView}
        />
        <label className="variant-switcher" title="Which variant is being edited">
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
      <TabPanels tabs={tabs} selected={view} idPrefix="view" className="view-body">
        {view === 'floorplan' && children}
        <Suspense fallback={<p className="view-loading">Loading…</p>}>
          {view === 'explorer' && <ExplorerView />}
          {view === 'variants' && <VariantsView />}
        </Suspense>
      </TabPanels>
    </div>
  );
}
