import { describe, expect, it } from 'vitest';
import { NdjsonSplitter, readNdjson } from '../../../src/api/ndjson';

const bytes = (text: string) => new TextEncoder().encode(text);

function streamOf(chunks: Uint8Array[]): ReadableStream<Uint8Array> {
  return new ReadableStream({
    start(controller) {
      for (const c of chunks) controller.enqueue(c);
      controller.close();
    },
  });
}

describe('NDJSON splitting of the batch traveller answer', () => {
  it('yields each line once, in order, however the chunks fall', () => {
    const text = '{"progress":{"done":0,"total":2}}\n{"progress":{"done":1,"total":2}}\n{"pdf":"JVBERi0=","fileName":"t.pdf"}\n';
    const whole: unknown[] = [];
    const whole$ = new NdjsonSplitter((v) => whole.push(v));
    whole$.push(bytes(text));
    whole$.end();
    for (let cut = 1; cut < text.length; cut += 7) {
      const seen: unknown[] = [];
      const s = new NdjsonSplitter((v) => seen.push(v));
      s.push(bytes(text.slice(0, cut)));
      s.push(bytes(text.slice(cut)));
      s.end();
      expect(seen).toEqual(whole);
    }
    expect(whole).toHaveLength(3);
  });

  it('keeps a multi-byte character cut across two chunks intact', () => {
    const encoded = bytes('{"error":{"message":"Ω/□ failed"}}\n');
    const omega = encoded.indexOf(0xce); // first byte of Ω in UTF-8
    const seen: unknown[] = [];
    const s = new NdjsonSplitter((v) => seen.push(v));
    s.push(encoded.slice(0, omega + 1));
    s.push(encoded.slice(omega + 1));
    s.end();
    expect(seen).toEqual([{ error: { message: 'Ω/□ failed' } }]);
  });

  it('reads a last line without a trailing newline and skips blank lines', async () => {
    const seen: unknown[] = [];
    await readNdjson(streamOf([bytes('{"a":1}\n\n'), bytes('{"b":2}')]), (v) => seen.push(v));
    expect(seen).toEqual([{ a: 1 }, { b: 2 }]);
  });

  it('refuses a line that is not JSON, naming it', () => {
    const s = new NdjsonSplitter(() => undefined);
    expect(() => s.push(bytes('<html>proxy error</html>\n'))).toThrow(/not JSON: <html>proxy error/);
  });
});
