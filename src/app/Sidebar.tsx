import { FoldButton } from './FoldButton';
import { lazy, Suspense, useState } from 'react';
import { ChecksPanel } from '../panels/ChecksPanel';
import { MetricsPanel } from '../panels/MetricsPanel';
import { PropertiesPanel } from '../panels/PropertiesPanel';
import { useUiStore } from '../store/uiStore';
import { TabBar, TabPanels, type TabSpec } from './a11y/TabBar';

// The tabs behind the first one load when first opened, so the first load carries only the editor.
const ProcessPanel = lazy(() => import('../panels/ProcessPanel').then((m) => ({ default: m.ProcessPanel })));
const CellsPanel = lazy(() => import('../panels/CellsPanel').then((m) => ({ default: m.CellsPanel })));
const YieldPanel = lazy(() => import('../panels/YieldPanel').then((m) => ({ default: m.YieldPanel })));

type TabId = 'floorplan' | 'process' | 'cells' | 'yield';
const TABS: readonly TabSpec<TabId>[] = [
  {
    id: 'floorplan',
    label: 'Selection',
    title: 'The selected blocks, the checks and the figures',
    testId: 'tab-floorplan',
  },
  { id: 'process', label: 'Process', title: 'Process and operating conditions', testId: 'tab-process' },
  { id: 'cells', label: 'Cells', title: 'The cell library', testId: 'tab-cells' },
  { id: 'yield', label: 'Yield', title: 'Die yield, redundancy and repair', testId: 'tab-yield' },
];

/** Right-hand panels, in tabs: the selection and its figures; the process; the cell library; yield and redundancy. Folds away. */
export function Sidebar() {
  const [tab, setTab] = useState<TabId>('floorplan');
  const collapsed = useUiStore((s) => s.sidebarCollapsed);
  const setCollapsed = useUiStore((s) => s.setSidebarCollapsed);
  if (collapsed) {
    return (
      <aside className="sidebar collapsed" aria-label="Panels (folded)">
        <FoldButton name="sidebar" what="the panels" folded symbol="«" onToggle={setCollapsed} />
      </aside>
    );
  }
  return (
    <aside className="sidebar" aria-label="Panels">
      <div className="sidebar-head">
        <TabBar<TabId>
          tabs={TABS}
          selected={tab}
          idPrefix="sidebar"
          label="Panels"
          className="tabs"
          onSelect={setTab}
        />
        <FoldButton name="sidebar" what="the panels" folded={false} symbol="»" onToggle={setCollapsed} />
      </div>
      <TabPanels tabs={TABS} selected={tab} idPrefix="sidebar">
        {tab === 'floorplan' && (
          <>
            <PropertiesPanel />
            <ChecksPanel />
            <MetricsPanel />
          </>
        )}
        <Suspense fallback={<p className="panel-loading">Loading…</p>}>
          {tab === 'process' && <ProcessPanel />}
          {tab === 'cells' && <CellsPanel />}
          {tab === 'yield' && <YieldPanel />}
        </Suspense>
      </TabPanels>
    </aside>
  );
}
