/**
 * Standalone report page entry (report.html): reads the ReportModel embedded in the page as
 * <script type="application/json" id="report-data">{"model": ..., "pageSize": "A4"}</script> and renders
 * the same report view the app shows. `wattledger report` inlines this bundle and the data into one
 * self-contained HTML file. When the view is drawn, <html data-report-ready="true"> tells a headless
 * browser it may print.
 */
import { flushSync, mount } from 'svelte';
import { REPORT_FORMAT, REPORT_VERSION } from '../shared-model/index.ts';
import type { ReportModel } from '../shared-model/index.ts';
import ReportView from './report/ReportView.svelte';
import { PAGE_SIZES, type PageSize } from './report/page-style.ts';

interface EmbeddedReport {
  model: ReportModel;
  pageSize: PageSize;
}

function readEmbedded(): EmbeddedReport | string {
  const element = document.getElementById('report-data');
  if (!element?.textContent) return 'This page holds no report data. Write a report with: npx wattledger report DESIGN.json -o FILE.html';
  let data: unknown;
  try {
    data = JSON.parse(element.textContent);
  } catch (error) {
    return `The report data in this page is not valid JSON (${(error as Error).message}).`;
  }
  const record = data as Partial<EmbeddedReport>;
  const model = record.model as Partial<ReportModel> | undefined;
  if (!model || model.format !== REPORT_FORMAT || model.version !== REPORT_VERSION) {
    return `The report data in this page is not a ${REPORT_FORMAT} version ${REPORT_VERSION} report.`;
  }
  const pageSize = PAGE_SIZES.includes(record.pageSize as PageSize) ? (record.pageSize as PageSize) : 'A4';
  return { model: model as ReportModel, pageSize };
}

function start(): void {
  const target = document.getElementById('report');
  if (!target) throw new Error('report.html has no #report element');
  const embedded = readEmbedded();
  if (typeof embedded === 'string') {
    target.textContent = embedded;
    document.documentElement.dataset.reportReady = 'error';
    return;
  }
  document.title = `${embedded.model.title.designName} — WattLedger design review`;
  mount(ReportView, { target, props: { model: embedded.model, pageSize: embedded.pageSize } });
  flushSync();
  document.documentElement.dataset.reportReady = 'true';
}

start();
