/**
 * Messages to the user: short notices that fade (saved, restored), problems that stay until dismissed
 * (a file that could not be opened, with the reasons), and yes/no questions answered in an in-page
 * dialog (discard unsaved changes?).
 */
export type MessageKind = 'info' | 'success' | 'error';

export interface Message {
  id: number;
  kind: MessageKind;
  title: string;
  details: string[];
  /** Messages with a tag replace each other (one at a time) and can be dismissed together. */
  tag?: string;
}

export interface Question {
  title: string;
  body: string;
  confirmLabel: string;
  cancelLabel: string;
  resolve(answer: boolean): void;
}

const FADE_MS = 6000;

export class Messages {
  list = $state<Message[]>([]);
  question = $state<Question | null>(null);
  #next = 1;

  show(kind: MessageKind, title: string, details: string[] = [], tag?: string): number {
    const id = this.#next++;
    const kept = tag === undefined ? this.list : this.list.filter((m) => m.tag !== tag);
    this.list = [...kept, { id, kind, title, details, ...(tag === undefined ? {} : { tag }) }];
    if (kind !== 'error') setTimeout(() => this.dismiss(id), FADE_MS);
    return id;
  }

  error(title: string, details: string[] = []): number {
    return this.show('error', title, details);
  }

  info(title: string, details: string[] = []): number {
    return this.show('info', title, details);
  }

  success(title: string, details: string[] = []): number {
    return this.show('success', title, details);
  }

  dismiss(id: number): void {
    this.list = this.list.filter((m) => m.id !== id);
  }

  /** Removes every message with this tag (their cause is gone). */
  dismissTagged(tag: string): void {
    if (this.list.some((m) => m.tag === tag)) this.list = this.list.filter((m) => m.tag !== tag);
  }

  /** Asks a yes/no question in the page; resolves true when the user confirms. */
  ask(title: string, body: string, confirmLabel: string, cancelLabel = 'Cancel'): Promise<boolean> {
    this.question?.resolve(false);
    return new Promise((resolve) => {
      this.question = {
        title,
        body,
        confirmLabel,
        cancelLabel,
        resolve: (answer) => {
          this.question = null;
          resolve(answer);
        },
      };
    });
  }
}
