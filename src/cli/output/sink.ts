import { once } from 'node:events';
import type { Writable } from 'node:stream';

/**
 * Buffered text output with back-pressure: writes accumulate in memory and go
 * out in blocks of about 64 kB, waiting for the stream to drain when it asks.
 */
export class Sink {
  private text = '';

  constructor(private readonly stream: Writable) {}

  write(text: string): void {
    this.text += text;
  }

  /** Flushes when enough has accumulated (or always, with force). */
  async flush(force = false): Promise<void> {
    if (this.text.length === 0 || (!force && this.text.length < 65536)) return;
    const text = this.text;
    this.text = '';
    if (!this.stream.write(text)) await once(this.stream, 'drain');
  }
}
