import { createInterface, type Interface } from 'node:readline';
import { Writable } from 'node:stream';

/**
 * Questions on the terminal. Answers typed for a hidden question are not echoed (the
 * readline output is muted while the answer is typed). With input from a pipe, each
 * question takes the next line.
 */
export class Prompt {
  private muted = false;
  private readonly lines: Interface;
  private readonly queued: string[] = [];
  private readonly waiting: Array<(line: string | null) => void> = [];
  private ended = false;

  constructor(
    input: NodeJS.ReadableStream = process.stdin,
    private readonly output: NodeJS.WritableStream = process.stdout,
  ) {
    const echo = new Writable({
      write: (chunk, _encoding, done) => {
        if (!this.muted) this.output.write(chunk);
        done();
      },
    });
    this.lines = createInterface({
      input,
      output: echo,
      terminal: Boolean((input as { isTTY?: boolean }).isTTY),
    });
    this.lines.on('line', (line) => {
      const next = this.waiting.shift();
      if (next) next(line);
      else this.queued.push(line);
    });
    this.lines.on('close', () => {
      this.ended = true;
      for (const next of this.waiting.splice(0)) next(null);
    });
  }

  /** Asks and returns the answer; null when the input has ended. */
  async ask(question: string, options: { hidden?: boolean } = {}): Promise<string | null> {
    this.output.write(question);
    this.muted = Boolean(options.hidden);
    const answer = await this.nextLine();
    this.muted = false;
    if (options.hidden) this.output.write('\n');
    return answer;
  }

  /** The next line of input without a question (a password piped on standard input). */
  nextLine(): Promise<string | null> {
    const line = this.queued.shift();
    if (line !== undefined) return Promise.resolve(line);
    if (this.ended) return Promise.resolve(null);
    return new Promise((resolve) => this.waiting.push(resolve));
  }

  close(): void {
    this.lines.close();
  }
}
