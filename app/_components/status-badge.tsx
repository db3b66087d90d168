import type { ReactNode } from 'react';
import { subscriptionLabels, subscriptionTone, type SubscriptionState } from '@/lib/billing/labels';

export type BadgeTone = 'neutral' | 'info' | 'good' | 'caution' | 'danger' | 'heat';

const tones: Record<BadgeTone, string> = {
  neutral: 'border-paper-line bg-paper-sunk text-ink-soft',
  info: 'border-tide-100 bg-tide-50 text-tide-700',
  good: 'border-tide-500/40 bg-tide-50 text-tide-700',
  caution: 'border-severity-caution/40 bg-paper-raised text-severity-caution',
  danger: 'border-severity-danger/40 bg-paper-raised text-severity-danger',
  heat: 'border-copper-100 bg-copper-50 text-copper-700',
};

/** A small labelled status chip; the word carries the meaning, the colour only supports it. */
export function StatusBadge({
  tone = 'neutral',
  children,
  testId,
}: {
  tone?: BadgeTone;
  children: ReactNode;
  testId?: string;
}) {
  return (
    <span
      data-testid={testId}
      className={`inline-flex items-center rounded-full border px-2 py-0.5 text-hint font-medium whitespace-nowrap ${tones[tone]}`}
    >
      {children}
    </span>
  );
}

const quoteTones: Record<string, BadgeTone> = { draft: 'neutral', sent: 'info', won: 'good', lost: 'danger' };

export const quoteStatusLabels: Record<string, string> = { draft: 'Draft', sent: 'Sent', won: 'Won', lost: 'Lost' };

export function QuoteStatusBadge({ status }: { status: string }) {
  return (
    <StatusBadge tone={quoteTones[status] ?? 'neutral'} testId="quote-status">
      {quoteStatusLabels[status] ?? status}
    </StatusBadge>
  );
}

/** A subscription's state in Dutywise's words (lib/billing/labels.ts), never the payment provider's code. */
export function SubscriptionBadge({ state }: { state: SubscriptionState }) {
  return (
    <StatusBadge tone={subscriptionTone[state]} testId="subscription-badge">
      {subscriptionLabels[state]}
    </StatusBadge>
  );
}

/** Heater duties take the copper accent, compressor power the teal. */
export function ServiceBadge({ service }: { service: 'heater' | 'compressor' }) {
  return (
    <StatusBadge tone={service === 'heater' ? 'heat' : 'info'}>
      {service === 'heater' ? 'Heater' : 'Compressor'}
    </StatusBadge>
  );
}
