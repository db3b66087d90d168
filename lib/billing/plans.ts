// The plan catalogue: one subscription per customer account unlocks datasheet downloads.
// Price ids come from configuration (the local fake serves the defaults).
export type PlanKey = 'monthly' | 'annual';

export type Plan = { key: PlanKey; name: string; priceLabel: string; interval: 'month' | 'year'; blurb: string };

export const plans: readonly Plan[] = [
  {
    key: 'monthly',
    name: 'Desk monthly',
    priceLabel: '€290 / month',
    interval: 'month',
    blurb: 'Run your own sizings and download every datasheet issued to your account. Cancel any time.',
  },
  {
    key: 'annual',
    name: 'Desk annual',
    priceLabel: '€2,900 / year',
    interval: 'year',
    blurb: 'The same desk for a year, two months free.',
  },
];
