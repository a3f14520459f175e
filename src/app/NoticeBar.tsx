import { useAppStore } from '../store/useAppStore';

/** One-line message under the toolbar: a refused file, an autosave kept aside, a finished export. */
export function NoticeBar() {
  const notice = useAppStore((s) => s.notice);
  const setNotice = useAppStore((s) => s.setNotice);
  if (!notice) return null;
  return (
    <div
      className={`notice ${notice.kind}`}
      role={notice.kind === 'error' ? 'alert' : 'status'}
      data-testid="notice"
    >
      <span>{notice.text}</span>
      {notice.action && (
        <button
          type="button"
          className="notice-action"
          data-testid="notice-action"
          title={notice.action.title}
          onClick={() => {
            const { run } = notice.action ?? {};
            setNotice(null);
            run?.();
          }}
        >
          {notice.action.label}
        </button>
      )}
      <button type="button" onClick={() => setNotice(null)} aria-label="Dismiss" title="Dismiss this message">
        ×
      </button>
    </div>
  );
}
