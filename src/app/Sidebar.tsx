import { useState } from 'react';
import { CellsPanel } from '../panels/CellsPanel';
import { ChecksPanel } from '../panels/ChecksPanel';
import { MetricsPanel } from '../panels/MetricsPanel';
import { ProcessPanel } from '../panels/ProcessPanel';
import { PropertiesPanel } from '../panels/PropertiesPanel';
import { YieldPanel } from '../panels/YieldPanel';

const TABS = [
  { id: 'floorplan', label: 'Selection' },
  { id: 'process', label: 'Process' },
  { id: 'cells', label: 'Cells' },
  { id: 'yield', label: 'Yield' },
] as const;
type TabId = (typeof TABS)[number]['id'];

/** Right-hand panels, in tabs: the selection and its figures; the process; the cell library; yield and redundancy. */
export function Sidebar() {
  const [tab, setTab] = useState<TabId>('floorplan');
  return (
    <aside className="sidebar">
      <div className="tabs" role="tablist">
        {TABS.map((t) => (
          <button
            key={t.id}
            type="button"
            role="tab"
            aria-selected={tab === t.id}
            data-testid={`tab-${t.id}`}
            onClick={() => setTab(t.id)}
          >
            {t.label}
          </button>
        ))}
      </div>
      {tab === 'floorplan' && (
        <>
          <PropertiesPanel />
          <ChecksPanel />
          <MetricsPanel />
        </>
      )}
      {tab === 'process' && <ProcessPanel />}
      {tab === 'cells' && <CellsPanel />}
      {tab === 'yield' && <YieldPanel />}
    </aside>
  );
}
