import { lazy, Suspense, type ComponentType, type ReactNode } from 'react';

/** A component whose code is fetched after the first paint (see {@link afterFirstPaint}). */
export interface DeferredComponent<P extends object> {
  /** The component: its fallback until the code has arrived, the component itself from then on. */
  readonly Render: (props: { readonly props: P; readonly fallback: ReactNode }) => ReactNode;
  /** Starts fetching the code (call it from an effect, after the first paint); never rejects. */
  readonly preload: () => void;
}

/**
 * A panel part the first load does not carry: `load` imports its module on demand. Once the code has
 * arrived the part renders at once; a plain lazy component would still show its fallback for a frame
 * each time it mounts again.
 */
export function afterFirstPaint<P extends object>(
  load: () => Promise<ComponentType<P>>,
): DeferredComponent<P> {
  let loaded: ComponentType<P> | null = null;
  const fetchCode = () =>
    load().then((component) => {
      loaded = component;
      return { default: component };
    });
  const Lazy = lazy(fetchCode);
  function Render({ props, fallback }: { readonly props: P; readonly fallback: ReactNode }) {
    const Loaded = loaded;
    if (Loaded) return <Loaded {...props} />;
    return (
      <Suspense fallback={fallback}>
        <Lazy {...props} />
      </Suspense>
    );
  }
  return { Render, preload: () => void fetchCode().catch(() => undefined) };
}
