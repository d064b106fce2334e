// A finding whose message is written only when read: a cold layout makes some 2,500 findings and a reader looks at
// a few, so writing every message up front (and the row labels the messages quote) was a third of its cost.
import type { Finding, FindingTarget, Severity } from "@/lib/findings";

export class LoopFinding implements Finding {
  // private: not own properties, so a spread or JSON sees only the finding's fields (JSON through toJSON)
  #write: (() => string) | undefined;
  #message: string | undefined;
  constructor(
    public code: string,
    public severity: Severity,
    write: () => string,
    public why: string,
    public target: FindingTarget,
  ) {
    this.#write = write;
  }

  get message(): string {
    if (this.#message === undefined) {
      this.#message = this.#write!();
      this.#write = undefined; // let go of what the wording needed
    }
    return this.#message;
  }

  set message(text: string) {
    this.#message = text;
    this.#write = undefined;
  }

  /** The finding as plain data, message included, in the field order of a plain finding. */
  toJSON(): Finding {
    const { code, severity, message, why, target } = this;
    return { code, severity, message, why, target };
  }
}

/** A finding as plain data with its message as an own field (for a spread, or equality with one from JSON). */
export function plainFinding(f: Finding): Finding {
  return f instanceof LoopFinding ? f.toJSON() : f;
}
