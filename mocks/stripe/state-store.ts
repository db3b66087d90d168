import { existsSync, mkdirSync, readFileSync, renameSync, writeFileSync } from 'node:fs';
import { dirname } from 'node:path';
import { emptyState, type EventRecord, type FakeState } from './records';

/** In-memory state with optional persistence to one JSON file, so a demo restart keeps subscriptions. */
export class StateStore {
  state: FakeState;

  constructor(private readonly statePath?: string) {
    this.state = statePath ? loadState(statePath) : emptyState();
  }

  /** Writes the state atomically (temp file, then rename) so a crash never leaves half a file. */
  save(): void {
    if (!this.statePath) return;
    mkdirSync(dirname(this.statePath), { recursive: true });
    const temp = `${this.statePath}.${process.pid}.tmp`;
    writeFileSync(temp, JSON.stringify(this.state, null, 2));
    renameSync(temp, this.statePath);
  }

  reset(): void {
    this.state = emptyState();
    this.save();
  }

  findEvent(id: string): EventRecord | undefined {
    return this.state.events.find((event) => event.id === id);
  }
}

function loadState(path: string): FakeState {
  if (!existsSync(path)) return emptyState();
  const text = readFileSync(path, 'utf8');
  let parsed: unknown;
  try {
    parsed = JSON.parse(text);
  } catch (error) {
    // Refuse rather than start empty: silently dropping paid subscriptions would be worse.
    throw new Error(
      `Stripe fake state file ${path} is not valid JSON (${(error as Error).message}); move it aside to start fresh.`,
    );
  }
  if (typeof parsed !== 'object' || parsed === null || (parsed as { version?: unknown }).version !== 1) {
    throw new Error(
      `Stripe fake state file ${path} has an unknown layout (expected version 1); move it aside to start fresh.`,
    );
  }
  return { ...emptyState(), ...(parsed as FakeState) };
}
