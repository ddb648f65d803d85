// In-memory state of the payments fake, mirrored to one JSON file so a dev
// restart keeps open sessions, payments and the event log.
import { randomBytes } from "node:crypto";
import { existsSync, mkdirSync, readFileSync, renameSync, writeFileSync } from "node:fs";
import path from "node:path";

const ALPHABET = "0123456789ABCDEFGHIJKLMNOPQRSTUVWXYZabcdefghijklmnopqrstuvwxyz";
const STATE_VERSION = 1;
// Stored idempotent responses are dropped after a day, like the real API's window.
const IDEMPOTENCY_TTL_SECONDS = 24 * 60 * 60;

/** Random base-62 text; rejection sampling keeps every character equally likely. */
export function randomToken(length) {
  let out = "";
  while (out.length < length) {
    for (const byte of randomBytes(length * 2)) {
      if (byte < 248 && out.length < length) out += ALPHABET[byte % 62];
    }
  }
  return out;
}

export function newId(prefix) {
  // Checkout session ids are much longer than other ids in the real API; keep that so
  // column sizes chosen against the fake also fit real ids.
  return prefix === "cs_test" ? `cs_test_${randomToken(58)}` : `${prefix}_${randomToken(24)}`;
}

export const nowSeconds = () => Math.floor(Date.now() / 1000);

function emptyState() {
  return {
    version: STATE_VERSION,
    sessions: {},
    lineItems: {},
    paymentIntents: {},
    charges: {},
    refunds: {},
    events: [],
    idempotency: {},
    // Details that are not part of any API object (e.g. the card waiting on authentication).
    internal: {},
  };
}

export class Store {
  /** @param {string | undefined} directory — no directory keeps state in memory only. */
  constructor(directory) {
    this.file = directory ? path.join(directory, "state.json") : null;
    this.state = emptyState();
    if (directory) {
      mkdirSync(directory, { recursive: true });
      this.state = this.#load();
    }
    this.#pruneIdempotency();
  }

  #load() {
    if (!existsSync(this.file)) return emptyState();
    try {
      const loaded = JSON.parse(readFileSync(this.file, "utf8"));
      if (loaded?.version !== STATE_VERSION) throw new Error(`unknown state version ${loaded?.version}`);
      return { ...emptyState(), ...loaded };
    } catch (error) {
      // A broken file must not stop the dev stack from starting; keep it aside for a look.
      const aside = `${this.file}.unreadable-${Date.now()}`;
      renameSync(this.file, aside);
      console.warn(`payments-fake: could not read ${this.file} (${error.message}); moved it to ${aside} and started empty`);
      return emptyState();
    }
  }

  #pruneIdempotency() {
    const oldest = nowSeconds() - IDEMPOTENCY_TTL_SECONDS;
    for (const [key, record] of Object.entries(this.state.idempotency)) {
      if (record.created < oldest) delete this.state.idempotency[key];
    }
  }

  /** Writes a temporary file and renames it over the old one, so a crash never leaves half a file. */
  save() {
    if (!this.file) return;
    const temporary = `${this.file}.${process.pid}.${randomToken(8)}.tmp`;
    writeFileSync(temporary, JSON.stringify(this.state));
    renameSync(temporary, this.file);
  }

  get sessions() {
    return this.state.sessions;
  }
  get lineItems() {
    return this.state.lineItems;
  }
  get paymentIntents() {
    return this.state.paymentIntents;
  }
  get charges() {
    return this.state.charges;
  }
  get refunds() {
    return this.state.refunds;
  }
  get events() {
    return this.state.events;
  }
  get idempotency() {
    return this.state.idempotency;
  }
  get internal() {
    return this.state.internal;
  }
}
