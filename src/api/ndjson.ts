/**
 * Splits a byte stream of newline-delimited JSON into parsed lines as they
 * arrive. A line may be cut across chunks (and a multi-byte character across
 * a chunk boundary); both are held until the rest comes.
 */
export class NdjsonSplitter<T = unknown> {
  private buffer = '';
  private readonly decoder = new TextDecoder();

  constructor(private readonly onLine: (value: T) => void) {}

  push(chunk: Uint8Array): void {
    this.buffer += this.decoder.decode(chunk, { stream: true });
    let newline = this.buffer.indexOf('\n');
    while (newline >= 0) {
      this.emit(this.buffer.slice(0, newline));
      this.buffer = this.buffer.slice(newline + 1);
      newline = this.buffer.indexOf('\n');
    }
  }

  /** The last line may come without a trailing newline. */
  end(): void {
    this.buffer += this.decoder.decode();
    this.emit(this.buffer);
    this.buffer = '';
  }

  private emit(text: string): void {
    const line = text.trim();
    if (line === '') return;
    try {
      this.onLine(JSON.parse(line) as T);
    } catch (cause) {
      throw new Error(`The server sent a line that is not JSON: ${line.slice(0, 80)}`, { cause });
    }
  }
}

/** Reads a whole NDJSON stream, calling `onLine` for each value in order. */
export async function readNdjson<T>(stream: ReadableStream<Uint8Array>, onLine: (value: T) => void): Promise<void> {
  const splitter = new NdjsonSplitter<T>(onLine);
  const reader = stream.getReader();
  for (;;) {
    const { done, value } = await reader.read();
    if (done) break;
    splitter.push(value);
  }
  splitter.end();
}
