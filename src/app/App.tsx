import { ChecksPanel } from '../panels/ChecksPanel';
import { MetricsPanel } from '../panels/MetricsPanel';
import { PropertiesPanel } from '../panels/PropertiesPanel';
import { EditorColumn } from './EditorColumn';
import { Toolbar } from './Toolbar';

export function App() {
  return (
    <div className="app">
      <Toolbar />
      <main className="workspace">
        <EditorColumn />
        <aside className="sidebar">
          <PropertiesPanel />
          <MetricsPanel />
          <ChecksPanel />
        </aside>
      </main>
      <footer className="caution" data-testid="caution">
        First-order estimates from textbook physics. Silicon decisions need extracted parasitics, foundry
        rules and measured data. Click any figure for its formula, inputs and source.
      </footer>
    </div>
  );
}
