import { once } from 'node:events';
import type { Writable } from 'node:stream';

/**
 * Buffered text output with back-pressure: writes accumulate in memory and go
 * out in blocks of about 64 kB, waiting for the stream to drain when it asks.
 */
export class Sink {
  private parts: string[] = [];
  private size = 0;

  constructor(private readonly stream: Writable) {}

  write(text: string): void {
    this.parts.push(text);
    this.size += text.length;
  }

  /** Flushes when enough has accumulated (or always, with force). */
  async flush(force = false): Promise<void> {
    if (this.size === 0 || (!force && this.size < 65536)) return;
    const text = this.parts.join('');
    this.parts = [];
    this.size = 0;
    if (!this.stream.write(text)) await once(this.stream, 'drain');
  }
}
