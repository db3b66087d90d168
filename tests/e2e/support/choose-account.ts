import type { Locator } from '@playwright/test';

/** Chooses an account in a picker by its name: options read "Name — site · contact" to tell accounts apart. */
export async function chooseAccount(select: Locator, name: string): Promise<void> {
  const options = await select
    .locator('option')
    .evaluateAll((els) => els.map((el) => ({ value: (el as HTMLOptionElement).value, text: el.textContent ?? '' })));
  const match = options.find((o) => o.text === name || o.text.startsWith(`${name} — `));
  if (!match) throw new Error(`no account named ${name} among: ${options.map((o) => o.text).join(' | ')}`);
  await select.selectOption(match.value);
}
