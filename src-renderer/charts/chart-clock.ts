/**
 * Speed marks for the charts (read by the end-to-end run): the first chart drawn after page load
 * ("wattledger:first-chart", its startTime is milliseconds since navigation), and the newest chart
 * drawing ("wattledger:chart-drawn": only the latest is kept, so a long session does not pile up marks).
 * `onFirstChart` lets the start-up order (shell/startup.svelte.ts) wait for the first chart.
 */
let firstDrawn = false;
const waiting: (() => void)[] = [];

export function chartDrawn(): void {
  if (!firstDrawn) {
    firstDrawn = true;
    performance.mark('wattledger:first-chart');
    for (const notify of waiting.splice(0)) notify();
  }
  performance.clearMarks('wattledger:chart-drawn');
  performance.mark('wattledger:chart-drawn');
}

/** Calls `notify` once, when the first chart has drawn (at once if it already has). */
export function onFirstChart(notify: () => void): void {
  if (firstDrawn) notify();
  else waiting.push(notify);
}
