import { create } from 'zustand';

/**
 * Session preferences of the app shell that outlive a reload: the colour theme and whether the sidebar
 * is folded away. Kept in browser storage under one key; never part of the document.
 */
export type ThemeChoice = 'system' | 'light' | 'dark';

export interface UiState {
  readonly theme: ThemeChoice;
  readonly sidebarCollapsed: boolean;
  readonly outlineCollapsed: boolean;
  setTheme(theme: ThemeChoice): void;
  setSidebarCollapsed(collapsed: boolean): void;
  setOutlineCollapsed(collapsed: boolean): void;
}

export const UI_STORAGE_KEY = 'matloom.ui';

interface Stored {
  theme?: unknown;
  sidebarCollapsed?: unknown;
  outlineCollapsed?: unknown;
}

function readStored(storage: Pick<Storage, 'getItem'> | null): Partial<UiState> {
  try {
    const parsed = JSON.parse(storage?.getItem(UI_STORAGE_KEY) ?? '{}') as Stored;
    const theme = parsed.theme;
    return {
      theme: theme === 'light' || theme === 'dark' || theme === 'system' ? theme : 'system',
      sidebarCollapsed: parsed.sidebarCollapsed === true,
      outlineCollapsed: parsed.outlineCollapsed === true,
    };
  } catch {
    return {};
  }
}

export function createUiStore(storage: Pick<Storage, 'getItem' | 'setItem'> | null) {
  const store = create<UiState>()((set) => ({
    theme: 'system',
    sidebarCollapsed: false,
    outlineCollapsed: false,
    ...readStored(storage),
    setTheme: (theme) => set({ theme }),
    setSidebarCollapsed: (sidebarCollapsed) => set({ sidebarCollapsed }),
    setOutlineCollapsed: (outlineCollapsed) => set({ outlineCollapsed }),
  }));
  store.subscribe((s) => {
    try {
      storage?.setItem(
        UI_STORAGE_KEY,
        JSON.stringify({
          theme: s.theme,
          sidebarCollapsed: s.sidebarCollapsed,
          outlineCollapsed: s.outlineCollapsed,
        }),
      );
    } catch {
      // Storage full or refused: the preference lasts for this session only.
    }
  });
  return store;
}

function browserStorage(): Storage | null {
  try {
    return typeof localStorage === 'undefined' ? null : localStorage;
  } catch {
    return null;
  }
}

export const useUiStore = createUiStore(browserStorage());
