/**
 * Finds where a JSON text goes wrong and says why, with line and column (1-based), for files that
 * JSON.parse refuses. JavaScript engines word their own errors differently (and some give no position),
 * so this small scanner follows the JSON grammar of RFC 8259 / ECMA-404 itself. Only syntax is checked.
 */

export interface JsonSyntaxError {
  offset: number;
  line: number;
  column: number;
  reason: string;
}

const MAX_DEPTH = 512;
const NUMBER = /-?(0|[1-9]\d*)(\.\d+)?([eE][+-]?\d+)?/y;

class Scanner {
  i = 0;
  constructor(readonly s: string) {}

  fail(reason: string): never {
    throw new SyntaxErrorAt(this.i, reason);
  }

  ws(): void {
    while (this.i < this.s.length && ' \t\n\r'.includes(this.s[this.i] ?? '')) this.i += 1;
  }

  peek(): string {
    return this.s[this.i] ?? '';
  }

  describe(): string {
    const c = this.peek();
    return c === '' ? 'the end of the text' : `"${c}"`;
  }

  value(depth: number): void {
    if (depth > MAX_DEPTH) this.fail('the document is nested too deeply');
    this.ws();
    const c = this.peek();
    if (c === '{') this.object(depth);
    else if (c === '[') this.array(depth);
    else if (c === '"') this.string();
    else if (c === '-' || (c >= '0' && c <= '9')) this.number();
    else if (!this.word('true') && !this.word('false') && !this.word('null'))
      this.fail(c === "'" ? 'text must be in double quotes (")' : `a value was expected but found ${this.describe()}`);
  }

  word(w: string): boolean {
    if (!this.s.startsWith(w, this.i)) return false;
    this.i += w.length;
    return true;
  }

  object(depth: number): void {
    this.i += 1;
    this.ws();
    if (this.peek() === '}') return void (this.i += 1);
    for (;;) {
      this.ws();
      if (this.peek() !== '"') this.fail(`a key in double quotes was expected but found ${this.describe()}`);
      this.string();
      this.ws();
      if (this.peek() !== ':') this.fail(`":" was expected after the key but found ${this.describe()}`);
      this.i += 1;
      this.value(depth + 1);
      this.ws();
      if (this.peek() === ',') {
        this.i += 1;
        this.ws();
        if (this.peek() === '}') this.fail('a comma before "}" is not allowed in JSON');
        continue;
      }
      if (this.peek() === '}') return void (this.i += 1);
      this.fail(`"," or "}" was expected after a value but found ${this.describe()}`);
    }
  }

  array(depth: number): void {
    this.i += 1;
    this.ws();
    if (this.peek() === ']') return void (this.i += 1);
    for (;;) {
      this.value(depth + 1);
      this.ws();
      if (this.peek() === ',') {
        this.i += 1;
        this.ws();
        if (this.peek() === ']') this.fail('a comma before "]" is not allowed in JSON');
        continue;
      }
      if (this.peek() === ']') return void (this.i += 1);
      this.fail(`"," or "]" was expected after a list item but found ${this.describe()}`);
    }
  }

  string(): void {
    this.i += 1;
    while (this.i < this.s.length) {
      const c = this.s.charCodeAt(this.i);
      if (c === 0x22) return void (this.i += 1);
      if (c < 0x20) this.fail('a line break or control character inside text must be escaped');
      if (c === 0x5c) {
        const e = this.s[this.i + 1] ?? '';
        if (e === 'u' && /^[0-9a-fA-F]{4}$/.test(this.s.slice(this.i + 2, this.i + 6))) this.i += 6;
        else if ('"\\/bfnrt'.includes(e) && e !== '') this.i += 2;
        else this.fail(`"\\${e}" is not a JSON escape`);
      } else this.i += 1;
    }
    this.fail('the text is not closed with a double quote');
  }

  number(): void {
    // Sticky (y): matches at this.i without copying the rest of the text for every number.
    NUMBER.lastIndex = this.i;
    const m = NUMBER.exec(this.s);
    if (!m) this.fail('a number was expected');
    this.i += m[0].length;
  }
}

class SyntaxErrorAt {
  constructor(readonly offset: number, readonly reason: string) {}
}

/** Line and column (1-based, counted in UTF-16 code units) of an offset. */
export function lineColumn(text: string, offset: number): { line: number; column: number } {
  const before = text.slice(0, offset);
  const line = before.split('\n').length;
  return { line, column: offset - before.lastIndexOf('\n') };
}

/** The first syntax error of a JSON text, or null when the text is valid JSON. */
export function findJsonSyntaxError(text: string): JsonSyntaxError | null {
  const scanner = new Scanner(text);
  try {
    scanner.value(0);
    scanner.ws();
    if (scanner.i < text.length) scanner.fail(`the document ended but found more text: ${scanner.describe()}`);
    return null;
  } catch (error) {
    if (!(error instanceof SyntaxErrorAt)) throw error;
    return { offset: error.offset, reason: error.reason, ...lineColumn(text, error.offset) };
  }
}
