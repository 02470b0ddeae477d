/**
 * Speed marks for the charts (read by the end-to-end run): the first chart drawn after page load
 * ("wattledger:first-chart", its startTime is milliseconds since navigation), and the newest chart
 * drawing ("wattledger:chart-drawn": only the latest is kept, so a long session does not pile up marks).
 */
let firstDrawn = false;

export function chartDrawn(): void {
  if (!firstDrawn) {
    firstDrawn = true;
    performance.mark('wattledger:first-chart');
  }
  performance.clearMarks('wattledger:chart-drawn');
  performance.mark('wattledger:chart-drawn');
}
