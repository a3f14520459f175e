import { useEffect } from 'react';
import { useUiStore, type ThemeChoice as Choice } from '../store/uiStore';
import './theme.css';

const CHOICES: readonly { value: Choice; label: string }[] = [
  { value: 'system', label: 'System' },
  { value: 'light', label: 'Light' },
  { value: 'dark', label: 'Dark' },
];

const DARK_QUERY = '(prefers-color-scheme: dark)';

/** Writes the theme in force onto the page root: the chosen one, or the system's when "system". */
function useAppliedTheme(choice: Choice): void {
  useEffect(() => {
    const media = window.matchMedia(DARK_QUERY);
    const apply = () => {
      const dark = choice === 'dark' || (choice === 'system' && media.matches);
      document.documentElement.dataset.theme = dark ? 'dark' : 'light';
    };
    apply();
    media.addEventListener('change', apply);
    return () => media.removeEventListener('change', apply);
  }, [choice]);
}

/** The colour theme: follows the system's light or dark setting unless the person picks one. */
export function ThemeChoice() {
  const theme = useUiStore((s) => s.theme);
  const setTheme = useUiStore((s) => s.setTheme);
  useAppliedTheme(theme);
  return (
    <label className="theme-choice" title="Colour theme: follow the system, or always light or dark">
      <span className="theme-word">Theme</span>
      <select
        data-testid="theme-choice"
        value={theme}
        onChange={(e) => setTheme(CHOICES.find((c) => c.value === e.target.value)?.value ?? 'system')}
      >
        {CHOICES.map((c) => (
          <option key={c.value} value={c.value}>
            {c.label}
          </option>
        ))}
      </select>
    </label>
  );
}
