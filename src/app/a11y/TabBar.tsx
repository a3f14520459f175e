import { useRef, type KeyboardEvent, type ReactNode } from 'react';
import { OWN_KEYS_ATTRIBUTE } from './keyOwnership';

export interface TabSpec<T extends string> {
  readonly id: T;
  readonly label: ReactNode;
  /** Tooltip: what the tab shows. */
  readonly title: string;
  readonly testId: string;
}

interface TabBarProps<T extends string> {
  readonly tabs: readonly TabSpec<T>[];
  readonly selected: T;
  /** Prefix of the tab and panel element ids, unique on the page. */
  readonly idPrefix: string;
  /** Accessible name of the tab list. */
  readonly label: string;
  readonly className?: string;
  onSelect(id: T): void;
}

export function tabId(idPrefix: string, id: string): string {
  return `${idPrefix}-tab-${id}`;
}

export function panelId(idPrefix: string, id: string): string {
  return `${idPrefix}-panel-${id}`;
}

/**
 * A tab list following the WAI-ARIA tabs pattern: only the chosen tab is in the Tab order; Left and Right
 * (and Home, End) move to the neighbouring tab and show it; each tab names its panel with aria-controls.
 */
export function TabBar<T extends string>(props: TabBarProps<T>) {
  const { tabs, selected, idPrefix, label, className, onSelect } = props;
  const list = useRef<HTMLDivElement>(null);
  const onKeyDown = (e: KeyboardEvent<HTMLDivElement>) => {
    const at = tabs.findIndex((t) => t.id === selected);
    let next = -1;
    if (e.key === 'ArrowRight') next = (at + 1) % tabs.length;
    else if (e.key === 'ArrowLeft') next = (at - 1 + tabs.length) % tabs.length;
    else if (e.key === 'Home') next = 0;
    else if (e.key === 'End') next = tabs.length - 1;
    const tab = tabs[next];
    if (!tab) return;
    e.preventDefault();
    onSelect(tab.id);
    list.current?.querySelector<HTMLElement>(`#${tabId(idPrefix, tab.id)}`)?.focus();
  };
  return (
    <div
      ref={list}
      className={className}
      role="tablist"
      aria-label={label}
      onKeyDown={onKeyDown}
      {...{ [OWN_KEYS_ATTRIBUTE]: '' }}
    >
      {tabs.map((t) => (
        <button
          key={t.id}
          id={tabId(idPrefix, t.id)}
          type="button"
          role="tab"
          aria-selected={t.id === selected}
          aria-controls={panelId(idPrefix, t.id)}
          tabIndex={t.id === selected ? 0 : -1}
          title={t.title}
          data-testid={t.testId}
          onClick={() => onSelect(t.id)}
        >
          {t.label}
        </button>
      ))}
    </div>
  );
}

/**
 * The panels of a tab bar: the chosen one with its content, the others as empty hidden panels so that
 * every tab's aria-controls names an element.
 */
export function TabPanels<T extends string>(props: {
  readonly tabs: readonly TabSpec<T>[];
  readonly selected: T;
  readonly idPrefix: string;
  readonly className?: string;
  readonly children: ReactNode;
}) {
  const { tabs, selected, idPrefix, className, children } = props;
  return (
    <>
      {tabs.map((t) =>
        t.id === selected ? (
          <div
            key={t.id}
            id={panelId(idPrefix, t.id)}
            role="tabpanel"
            aria-labelledby={tabId(idPrefix, t.id)}
            className={className}
          >
            {children}
          </div>
        ) : (
          <div
            key={t.id}
            id={panelId(idPrefix, t.id)}
            role="tabpanel"
            aria-labelledby={tabId(idPrefix, t.id)}
            hidden
          />
        ),
      )}
    </>
  );
}
