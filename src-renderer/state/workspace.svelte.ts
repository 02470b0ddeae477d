/**
 * Everything the app shell shares: the open document, the results, the part library, messages, the
 * theme, the screen shown and the operating-system adapter. Created once in App.svelte and handed to
 * components through Svelte context.
 */
import { getContext, setContext } from 'svelte';
import type { Design, Part } from '../../shared-model/index.ts';
import type { FileAccess } from '../desktop/file-access.ts';
import { suggestFileName, type Recovered } from './design-file.ts';
import { DocumentStore, UNTITLED } from './document.svelte.ts';
import { ImportSession } from '../import/import-session.svelte.ts';
import { PartLibrary } from './library.svelte.ts';
import { RankingRun } from '../ranking/ranking-run.svelte.ts';
import { Messages } from './messages.svelte.ts';
import { ResultsState } from './results.svelte.ts';
import { ThemeState } from './theme.svelte.ts';
import type { PartStash } from './topology-edits.ts';

export type Screen = 'design' | 'library' | 'ranking' | 'import' | 'bench' | 'report';

export interface RecoveryOffer {
  recovered: Recovered;
  savedAt: string;
}

/** What a menu report command asks of the report screen. */
export type ReportRequest = 'print' | 'html';

export class Workspace {
  readonly files: FileAccess;
  readonly demoDesign: Design;
  readonly doc: DocumentStore;
  readonly results: ResultsState;
  readonly library: PartLibrary;
  /** The spreadsheet import in progress; kept while the user visits other screens. */
  readonly partImport = new ImportSession();
  /** The ranking view's choices and last ranking (kept across screens). */
  readonly ranking = new RankingRun();
  readonly messages = new Messages();
  readonly theme = new ThemeState();
  screen: Screen = $state('design');
  /** The results column takes the editor's room too ("Widen"); Escape or the same button returns. */
  resultsWide = $state(false);
  recoveryOffer: RecoveryOffer | null = $state(null);
  /** "New" is offering its blanks and demos (shell/NewDesignDialog.svelte). */
  choosingNew = $state(false);
  /** Set by the menu's report commands; the report screen prints or saves once its report is shown. */
  reportRequest: ReportRequest | null = $state(null);
  /** Parts set aside by rectifier or sense-resistor switches, restored when switching back. */
  stash: PartStash = {};

  constructor(files: FileAccess, demoDesign: Design, demoParts: readonly Part[]) {
    this.files = files;
    this.demoDesign = demoDesign;
    this.doc = new DocumentStore(demoDesign, suggestFileName(UNTITLED, demoDesign.name));
    this.results = new ResultsState(this.doc);
    this.library = new PartLibrary(demoParts);
  }

  /**
   * Shows the report screen and asks it, once the report is built, to print it (to a PDF in Electron,
   * the print dialog in a browser) or to save it as one self-contained HTML file.
   */
  requestReport(request: ReportRequest): void {
    this.screen = 'report';
    this.reportRequest = request;
  }
}

const KEY = Symbol('wattledger.workspace');

export function provideWorkspace(workspace: Workspace): void {
  setContext(KEY, workspace);
}

export function useWorkspace(): Workspace {
  const workspace = getContext<Workspace | undefined>(KEY);
  if (!workspace) throw new Error('useWorkspace() called outside App');
  return workspace;
}
