import { describe, expect, it } from 'vitest';
import { actionWords, detailWords } from '@/app/_components/audit-words';

describe('the audit trail in words', () => {
  it('names actions and changes without codes, ids or JSON', () => {
    expect(actionWords('user.role_changed')).toBe('Changed a role');
    expect(actionWords('quote.archived')).toBe('Quote archived');
    expect(
      detailWords('user.role_changed', {
        email: 'kai@example.test',
        from: 'sales_engineer',
        to: 'support',
        toLabel: 'Support',
      }),
    ).toBe('Sales engineer → Support · email: kai@example.test');
    expect(detailWords('billing.subscription_status', { subscription: 'x', from: null, to: 'past_due' })).toBe(
      'none → Payment failed',
    );
    expect(detailWords('quote.line_added', { sizingId: '0b0c7d3e-1111-4222-8333-944445555666', quantity: 2 })).toBe(
      'quantity: 2',
    );
  });
});
