'use client';

import { useState } from 'react';

/** The new key, shown once: Dutywise keeps only its hash, so it cannot be shown again. */
export function NewKeyNotice({ name, apiKey }: { name: string; apiKey: string }) {
  const [copied, setCopied] = useState(false);
  const copy = async () => {
    await navigator.clipboard.writeText(apiKey).then(
      () => setCopied(true),
      () => setCopied(false),
    );
  };
  return (
    <div
      role="status"
      className="space-y-2 rounded-md border border-tide-100 bg-tide-50 px-3 py-3 text-sm text-tide-700"
    >
      <p>
        <strong>{name}</strong> is ready. Copy the key now: it is shown only this once, and Dutywise keeps no copy it
        could show you later.
      </p>
      <p className="flex flex-wrap items-center gap-2">
        <code data-testid="api-key-value" className="break-all rounded bg-paper-raised px-2 py-1 font-mono text-ink">
          {apiKey}
        </code>
        <button type="button" onClick={copy} className="rounded-md border border-tide-100 px-2 py-1 hover:bg-tide-100">
          {copied ? 'Copied' : 'Copy'}
        </button>
      </p>
      <p className="text-hint">
        Send it as <code className="font-mono">Authorization: Bearer &lt;key&gt;</code> to{' '}
        <code className="font-mono">POST /api/v1/calculate</code>.
      </p>
    </div>
  );
}
