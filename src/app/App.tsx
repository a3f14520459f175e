import { EditorColumn } from './EditorColumn';
import { NoticeBar } from './NoticeBar';
import { Sidebar } from './Sidebar';
import { Toolbar } from './Toolbar';
import { StorageProblemBar } from './StorageProblemBar';
import { useAddressState } from './useAddressState';
import { useDocumentGuards } from './useDocumentGuards';
import { ViewArea } from './ViewArea';

export function App() {
  useDocumentGuards();
  useAddressState();
  return (
    <div className="app">
      <Toolbar />
      <StorageProblemBar />
      <NoticeBar />
      <main className="workspace">
        <ViewArea>
          <EditorColumn />
        </ViewArea>
        <Sidebar />
      </main>
      <footer className="caution" data-testid="caution">
        First-order estimates from textbook physics. Silicon decisions need extracted parasitics, foundry
        rules and measured data. Click any figure for its formula, inputs and source.
      </footer>
    </div>
  );
}
