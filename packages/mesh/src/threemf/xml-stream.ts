import { SaxesParser, type SaxesTagPlain } from 'saxes';
import { fail, ok, type MeshError, type Result } from '../result';

/** Raised inside a handler to stop the parse with a refusal; caught by the stream, never escapes it. */
class Stop {
  constructor(readonly error: MeshError) {}
}

export interface XmlHandlers {
  open(tag: SaxesTagPlain): void;
  close(name: string): void;
}

/**
 * A streaming XML reader fed with UTF-8 bytes piece by piece (3MF parts are UTF-8 by the core
 * specification §2.3.2), so a model part is never held whole in memory. A DOCTYPE is refused as
 * that section asks: it is the door to entity-expansion attacks.
 */
export class XmlStream {
  private readonly parser = new SaxesParser<{ xmlns: false; position: false }>({ xmlns: false, position: false });
  private readonly decoder = new TextDecoder('utf-8');
  private failure: MeshError | null = null;

  constructor(
    private readonly part: string,
    handlers: XmlHandlers,
  ) {
    this.parser.on('opentag', (tag) => handlers.open(tag));
    this.parser.on('closetag', (tag) => handlers.close(tag.name));
    this.parser.on('doctype', () => {
      throw new Stop({
        code: 'threemf_invalid',
        message: `The 3MF's part "${this.part}" declares a DOCTYPE, which a 3MF must not; export the mould again from your CAD program.`,
      });
    });
  }

  /** Stops the parse from inside a handler with this refusal. */
  static stop(code: MeshError['code'], message: string): never {
    throw new Stop({ code, message });
  }

  private guard(run: () => void): Result<void> {
    if (this.failure) return { ok: false, error: this.failure };
    try {
      run();
      return ok(undefined);
    } catch (err) {
      if (err instanceof Stop) this.failure = err.error;
      else {
        const detail = err instanceof Error ? err.message.replace(/\s+/g, ' ').slice(0, 120) : 'unreadable';
        this.failure = {
          code: 'threemf_invalid',
          message: `The 3MF's part "${this.part}" is not well-formed XML (${detail}); export the mould again and upload the whole file.`,
        };
      }
      return fail(this.failure.code, this.failure.message);
    }
  }

  write(chunk: Uint8Array): Result<void> {
    return this.guard(() => this.parser.write(this.decoder.decode(chunk, { stream: true })));
  }

  end(): Result<void> {
    return this.guard(() => {
      const rest = this.decoder.decode();
      if (rest) this.parser.write(rest);
      this.parser.close();
    });
  }
}
