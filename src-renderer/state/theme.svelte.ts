/**
 * Light or dark theme: follows prefers-color-scheme until the user picks one with the toggle; the
 * choice is remembered. The resolved theme is written to <html data-theme>, which app.css reads.
 */
export type ThemeChoice = 'system' | 'light' | 'dark';
export type ResolvedTheme = 'light' | 'dark';

const THEME_KEY = 'wattledger.theme';

function readChoice(): ThemeChoice {
  try {
    const stored = localStorage.getItem(THEME_KEY);
    return stored === 'light' || stored === 'dark' ? stored : 'system';
  } catch {
    return 'system';
  }
}

export class ThemeState {
  choice = $state<ThemeChoice>(readChoice());
  systemDark = $state(typeof window !== 'undefined' && window.matchMedia('(prefers-color-scheme: dark)').matches);
  resolved: ResolvedTheme = $derived(this.choice === 'system' ? (this.systemDark ? 'dark' : 'light') : this.choice);

  /** Starts following the system setting; returns a function that stops it. */
  start(): () => void {
    const query = window.matchMedia('(prefers-color-scheme: dark)');
    this.systemDark = query.matches;
    const onChange = (event: MediaQueryListEvent) => (this.systemDark = event.matches);
    query.addEventListener('change', onChange);
    return () => query.removeEventListener('change', onChange);
  }

  apply(): void {
    document.documentElement.dataset.theme = this.resolved;
  }

  /** The toggle switches to the other theme and remembers it. */
  toggle(): void {
    this.choice = this.resolved === 'dark' ? 'light' : 'dark';
    try {
      localStorage.setItem(THEME_KEY, this.choice);
    } catch {
      // Storage refused (private mode): the choice lasts for this session only.
    }
  }
}
