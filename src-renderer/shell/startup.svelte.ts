/**
 * Start-up order. What the engineer opens the app for — the efficiency curve of the design — is drawn
 * first; the parts of the page below the first screen (the editor's part, thermal and touch sections)
 * are built right after it, so they do not delay the first chart by the few hundred milliseconds their
 * hundreds of fields take to build. They are built at once, whichever comes first, when:
 * - the first chart has drawn (and the browser has had one frame to show it);
 * - the user presses a key or clicks anywhere (they may be heading for a field below);
 * - FALLBACK_MS have passed (a design whose results cannot be drawn still gets its editor).
 */
import { onFirstChart } from '../charts/chart-clock.ts';

export const FALLBACK_MS = 1500;

class Startup {
  /** True once the rest of the page may be built. */
  restReady = $state(false);
  #armed = false;

  /** Starts watching (once per page; later calls do nothing). */
  arm(): void {
    if (this.#armed) return;
    this.#armed = true;
    const ready = () => {
      this.restReady = true;
      clearTimeout(timer);
      window.removeEventListener('keydown', ready, true);
      window.removeEventListener('pointerdown', ready, true);
    };
    const timer = setTimeout(ready, FALLBACK_MS);
    window.addEventListener('keydown', ready, true);
    window.addEventListener('pointerdown', ready, true);
    onFirstChart(() => requestAnimationFrame(() => setTimeout(ready, 0)));
  }
}

export const startup = new Startup();
