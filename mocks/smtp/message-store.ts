import { randomUUID } from 'node:crypto';
import { existsSync, mkdirSync, readFileSync, renameSync, writeFileSync } from 'node:fs';
import { dirname } from 'node:path';

export type StoredAttachment = { filename: string | null; contentType: string; sizeBytes: number };

/** One received message, as the HTTP API returns it. */
export type StoredMessage = {
  id: string;
  receivedAt: string;
  /** SMTP envelope: who the client said it was sending from and to (includes Bcc recipients). */
  envelope: { from: string | null; to: string[] };
  from: string | null;
  to: string[];
  cc: string[];
  subject: string;
  text: string | null;
  html: string | null;
  /** The Date header, ISO 8601. */
  date: string | null;
  messageId: string | null;
  /** Header lines by lower-case name; a repeated header's values are joined by newlines. */
  headers: Record<string, string>;
  attachments: StoredAttachment[];
  sizeBytes: number;
};

export type NewMessage = Omit<StoredMessage, 'id' | 'receivedAt'>;

/** Messages in arrival order, optionally mirrored to a JSON file so a restarted fake keeps them. */
export class MessageStore {
  private items: StoredMessage[];

  constructor(private readonly statePath?: string) {
    this.items = statePath && existsSync(statePath) ? loadMessages(statePath) : [];
  }

  add(message: NewMessage): StoredMessage {
    const stored: StoredMessage = { id: randomUUID(), receivedAt: new Date().toISOString(), ...message };
    this.items.push(stored);
    this.save();
    return stored;
  }

  list(): StoredMessage[] {
    return [...this.items];
  }

  get(id: string): StoredMessage | undefined {
    return this.items.find((message) => message.id === id);
  }

  clear(): number {
    const removed = this.items.length;
    this.items = [];
    this.save();
    return removed;
  }

  private save(): void {
    if (!this.statePath) return;
    mkdirSync(dirname(this.statePath), { recursive: true });
    const temp = `${this.statePath}.${process.pid}.tmp`;
    writeFileSync(temp, JSON.stringify(this.items, null, 2));
    renameSync(temp, this.statePath);
  }
}

function loadMessages(path: string): StoredMessage[] {
  try {
    const parsed: unknown = JSON.parse(readFileSync(path, 'utf8'));
    if (!Array.isArray(parsed)) throw new Error('expected an array of messages');
    return parsed as StoredMessage[];
  } catch (error) {
    // Refuse to start over a file we cannot read rather than silently losing received mail.
    throw new Error(
      `SMTP fake state file ${path} cannot be read (${(error as Error).message}); move it aside to start fresh.`,
    );
  }
}
