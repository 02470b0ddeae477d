/**
 * One spreadsheet import in progress: the pasted or opened text, the kind of part (or "the Kind column"),
 * the mapping the user confirms, and the engine's preview of every row (shared-model part-import). The
 * mapping is guessed again whenever new text arrives or the kind changes; every other edit keeps it.
 */
import { guessMapping, mappingDocument, previewImport, readCsv, reuseMapping } from '../../shared-model/index.ts';
import type { ImportPreview, PartKind, PartMapping } from '../../shared-model/index.ts';

export type KindChoice = PartKind | 'column';

export class ImportSession {
  text = $state('');
  sourceName = $state('');
  kind: KindChoice = $state('mosfet');
  mapping: PartMapping = $state.raw(mappingDocument({ columns: [], fixed: [] }));
  readonly table = $derived(readCsv(this.text));
  readonly headers: string[] = $derived(this.table.rows[0]?.cells.map((h) => h.trim()) ?? []);
  /** The first data row, shown beside each column as an example. */
  readonly sample: string[] = $derived(this.table.rows[1]?.cells ?? []);
  readonly preview: ImportPreview | null = $derived(this.headers.length > 0 ? previewImport(this.table, this.mapping) : null);

  load(text: string, name: string): void {
    this.text = text;
    this.sourceName = name;
    this.guess();
  }

  setKind(kind: KindChoice): void {
    this.kind = kind;
    this.guess();
  }

  guess(): void {
    this.mapping = guessMapping(this.headers, this.kind === 'column' ? undefined : this.kind);
  }

  /** Applies a saved mapping to these headers (same header: its field and unit; others guessed). */
  reuse(saved: PartMapping): void {
    this.kind = saved.kind ?? 'column';
    this.mapping = reuseMapping(this.headers, saved);
  }

  setColumn(index: number, field: string | null): void {
    this.mapping = { ...this.mapping, columns: this.mapping.columns.map((c, i) => (i === index ? { ...c, field } : c)) };
  }

  setUnit(index: number, unit: string): void {
    this.mapping = { ...this.mapping, columns: this.mapping.columns.map((c, i) => (i === index ? { ...c, unit } : c)) };
  }

  /** The same text for `field` in every row ("" removes it). */
  setFixed(field: string, text: string): void {
    const rest = this.mapping.fixed.filter((f) => f.field !== field);
    this.mapping = { ...this.mapping, fixed: text.trim() === '' ? rest : [...rest, { field, text }] };
  }

  fixedText(field: string): string {
    return this.mapping.fixed.find((f) => f.field === field)?.text ?? '';
  }
}
