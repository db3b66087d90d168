import path from 'node:path';
import { expect, test, type Page } from '@playwright/test';
import {
  fixed,
  formatA,
  formatKw,
  formatRating,
  showTemperature,
} from '@/app/_components/sizing-result/quantity-format';
import { localiseText } from '@/app/_components/sizing-result/localise-text';
import { DEMO_PASSWORD } from '@/lib/auth/demo-users';
import { calculate, headlineMethod, type SizingRequest } from '@/lib/engine';
import { convertQuantity } from '@/lib/units';
import { chooseAccount } from './support/choose-account';

// Journeys on the sizing desk. Expected figures always come from the engine itself (calculate() on the
// same request), formatted with the desk's own formatter: the screen must show exactly what the engine says.

const shots = path.join(__dirname, '__screenshots__');

type HeaterSpec = {
  flow: [string, string];
  inletT: [string, string];
  pressure: [string, string];
  outletT: [string, string];
  system: 'si' | 'us';
};
type CompressorSpec = {
  gas: string;
  flow: [string, string];
  inletT: [string, string];
  pressure: [string, string];
  discharge: [string, string];
  intercooler: [string, string];
  baro: [string, string];
  system: 'si' | 'us';
};

async function openDesk(page: Page, url = '/size') {
  await page.goto(url);
  await expect(page.getByTestId('sizing-desk')).toHaveAttribute('data-hydrated', 'true');
}

/** Picks the unit first (which converts what is there), then types the value in that unit. */
async function setQuantity(page: Page, key: string, value: string, unit: string) {
  await page.getByTestId(`field-${key}-unit`).selectOption(unit);
  await page.getByTestId(`field-${key}`).fill(value);
}

async function waitReady(page: Page) {
  await expect(page.getByTestId('result-panel')).toHaveAttribute('data-state', 'ready');
}

async function fillHeater(page: Page, s: HeaterSpec) {
  await page.getByTestId(`unit-system-${s.system}`).check();
  await page.getByTestId('service-heater').check();
  await page.getByTestId('gas-mode-preset').check();
  await page.getByTestId('field-gas-preset').selectOption('air');
  await setQuantity(page, 'site-barometricPressure', '101.325', 'kPa');
  await setQuantity(page, 'flow', ...s.flow);
  await setQuantity(page, 'inlet-temperature', ...s.inletT);
  await setQuantity(page, 'inlet-pressure', ...s.pressure);
  await setQuantity(page, 'outletTemperature', ...s.outletT);
  await page.getByTestId('field-heatLossPercent').fill('5');
  await page.getByTestId('field-designMarginPercent').fill('10');
  await page.getByTestId('field-supply-voltageV').fill(s.system === 'us' ? '480' : '400');
  await page.getByTestId('phases-3').check();
  await page.getByTestId('field-heaterRatingsKw').fill('');
}

function heaterRequest(s: HeaterSpec): SizingRequest {
  const q = ([value, unit]: [string, string]) => ({ value: Number(value), unit });
  return {
    service: 'heater',
    gas: { preset: 'air' },
    flow: q(s.flow),
    inlet: { temperature: q(s.inletT), pressure: q(s.pressure) },
    site: { barometricPressure: { value: 101.325, unit: 'kPa' } },
    outletTemperature: q(s.outletT),
    heatLossPercent: 5,
    designMarginPercent: 10,
    supply: { voltageV: s.system === 'us' ? 480 : 400, phases: 3 },
  };
}

async function expectHeaterFigures(page: Page, request: SizingRequest, system: 'si' | 'us' = 'si') {
  const r = calculate(request);
  if (r.service !== 'heater') throw new Error('heater expected');
  await waitReady(page);
  await expect(page.getByTestId('result-design-duty-kw')).toHaveText(formatKw(r.heater.designDutyKw));
  await expect(page.getByTestId('result-absorbed-duty-kw')).toHaveText(formatKw(r.heater.absorbedDutyKw));
  await expect(page.getByTestId('result-average-cp-duty-kw')).toHaveText(formatKw(r.heater.averageCpDutyKw));
  await expect(page.getByTestId('result-selected-rating-kw')).toHaveText(
    formatRating(r.heater.selectedRatingKw ?? NaN),
  );
  await expect(page.getByTestId('result-current-a')).toHaveText(formatA(r.heater.electrical.currentA));
  await expect(page.getByTestId('result-continuous-current-a')).toHaveText(
    formatA(r.heater.electrical.continuousCurrentA),
  );
  await expect(page.getByTestId('flow-kg-per-s')).toHaveText(fixed(r.massFlowKgPerS, 4));
  for (const w of r.warnings)
    await expect(
      w.code === 'preliminary'
        ? page.getByTestId('preliminary-statement').first()
        : page.getByTestId(`warning-${w.code}`),
    ).toContainText(w.code === 'preliminary' ? w.message : localiseText(w.message, system));
  await expect(page.getByTestId('chart-heater-cp')).toBeVisible();
}

async function fillCompressor(page: Page, s: CompressorSpec) {
  await page.getByTestId(`unit-system-${s.system}`).check();
  await page.getByTestId('service-compressor').check();
  await page.getByTestId('gas-mode-preset').check();
  await page.getByTestId('field-gas-preset').selectOption(s.gas);
  await setQuantity(page, 'site-barometricPressure', ...s.baro);
  await setQuantity(page, 'flow', ...s.flow);
  await setQuantity(page, 'inlet-temperature', ...s.inletT);
  await setQuantity(page, 'inlet-pressure', ...s.pressure);
  await setQuantity(page, 'dischargePressure', ...s.discharge);
  await page.getByTestId('stages-3').check();
  await page.getByTestId('efficiency-isentropic').check();
  await page.getByTestId('field-efficiency').fill('0.78');
  await setQuantity(page, 'intercoolerOutletTemperature', ...s.intercooler);
  await page.getByTestId('field-interstagePressureDropPercent').fill('1');
  await page.getByTestId('field-mechanicalEfficiency').fill('0.98');
  await page.getByTestId('field-dischargeTemperatureLimit').fill('');
  await page.getByTestId('method-variable-cp').check();
  await page.getByTestId('field-supply-voltageV').fill(s.system === 'us' ? '480' : '400');
  await page.getByTestId('phases-3').check();
}

function compressorRequest(s: CompressorSpec): SizingRequest {
  const q = ([value, unit]: [string, string]) => ({ value: Number(value), unit });
  return {
    service: 'compressor',
    gas: { preset: s.gas },
    flow: q(s.flow),
    inlet: { temperature: q(s.inletT), pressure: q(s.pressure) },
    site: { barometricPressure: q(s.baro) },
    dischargePressure: q(s.discharge),
    stages: 3,
    isentropicEfficiency: 0.78,
    intercoolerOutletTemperature: q(s.intercooler),
    interstagePressureDropPercent: 1,
    mechanicalEfficiency: 0.98,
    method: 'variable-cp',
    supply: { voltageV: s.system === 'us' ? 480 : 400, phases: 3 },
  };
}

async function expectCompressorFigures(page: Page, request: SizingRequest, system: 'si' | 'us') {
  const r = calculate(request);
  if (r.service !== 'compressor') throw new Error('compressor expected');
  const c = r.compressor;
  await waitReady(page);
  await expect(page.getByTestId('result-shaft-power-kw')).toHaveText(formatKw(c.shaftPowerKw));
  await expect(page.getByTestId('result-gas-power-kw')).toHaveText(formatKw(c.gasPowerKw));
  if (c.motor.iecKw !== null) await expect(page.getByTestId('result-motor-iec-kw')).toHaveText(String(c.motor.iecKw));
  if (c.motor.nemaHp !== null)
    await expect(page.getByTestId('result-motor-nema-hp')).toHaveText(String(c.motor.nemaHp));
  await expect(page.getByTestId('stage-table').locator('tbody tr')).toHaveCount(3);
  // The stage table opens on the headline method: the real-gas one when an equation of state was used.
  const shown = headlineMethod(c);
  for (const s of shown.stages) {
    await expect(page.getByTestId(`stage-row-${s.stage}`)).toBeVisible();
    await expect(page.getByTestId(`stage-${s.stage}-discharge-temperature`)).toHaveText(
      showTemperature(s.dischargeTemperatureC, system).value,
    );
    await expect(page.getByTestId(`stage-${s.stage}-power-kw`)).toHaveText(formatKw(s.gasPowerKw));
  }
  for (const [i, duty] of shown.intercoolerDutiesKw.entries())
    await expect(page.getByTestId(`intercooler-${i + 1}-kw`)).toHaveText(formatKw(duty));
  // Both methods side by side, with their difference.
  const methods = page.getByTestId('method-comparison');
  await expect(methods).toContainText(`${formatKw(c.constantK.gasPowerKw)} kW`);
  await expect(methods).toContainText(`${formatKw(c.variableCp.gasPowerKw)} kW`);
  // With an equation of state the headline compares ideal gas with real gas; with ideal gas, the two methods.
  if (c.idealGasDifferencePercent !== null)
    await expect(page.getByTestId('result-ideal-gas-difference')).toHaveText(fixed(c.idealGasDifferencePercent, 2));
  else await expect(page.getByTestId('result-method-difference')).toHaveText(fixed(c.methodDifferencePercent, 2));
  await expect(page.getByTestId('result-suggested-stages')).toHaveText(
    c.suggestedStages === null ? 'none ≤ 6' : String(c.suggestedStages),
  );
  await expect(page.getByTestId('chart-stages')).toBeVisible();
  await expect(page.getByTestId('chart-sweep')).toBeVisible();
}

async function fullShot(page: Page, name: string) {
  await page.evaluate(() => window.scrollTo(0, 0));
  await page.screenshot({ path: path.join(shots, name), fullPage: true });
}

/** Fills and sends the sign-in form once React has hydrated it (a click before that would submit natively). */
async function submitSignIn(page: Page, email: string) {
  await page.waitForFunction(() => {
    const button = document.querySelector('form button[type="submit"]');
    return !!button && Object.keys(button).some((k) => k.startsWith('__reactProps'));
  });
  await page.getByLabel('E-mail').fill(email);
  await page.getByLabel('Password').fill(DEMO_PASSWORD);
  await page.getByRole('button', { name: 'Sign in' }).click();
}

async function signIn(page: Page, email: string, next = '/size') {
  await page.goto(`/sign-in?next=${encodeURIComponent(next)}`);
  await submitSignIn(page, email);
  await page.waitForURL((url) => url.pathname === new URL(next, 'http://x').pathname);
}

const siHeater: HeaterSpec = {
  flow: ['2', 't/h'],
  inletT: ['15', 'degC'],
  pressure: ['3', 'barg'],
  outletT: ['320', 'degC'],
  system: 'si',
};
const usHeater: HeaterSpec = {
  flow: ['4400', 'lb/h'],
  inletT: ['60', 'degF'],
  pressure: ['45', 'psig'],
  outletT: ['600', 'degF'],
  system: 'us',
};
const usCompressor: CompressorSpec = {
  gas: 'nitrogen',
  flow: ['1000', 'SCFM'],
  inletT: ['70', 'degF'],
  pressure: ['0', 'psig'],
  discharge: ['400', 'psig'],
  intercooler: ['100', 'degF'],
  baro: ['14.696', 'psia'],
  system: 'us',
};
const siCompressor: CompressorSpec = {
  gas: 'nitrogen',
  flow: ['1500', 'Nm3/h'],
  inletT: ['20', 'degC'],
  pressure: ['1', 'bar'],
  discharge: ['30', 'bar'],
  intercooler: ['40', 'degC'],
  baro: ['101.325', 'kPa'],
  system: 'si',
};

test.describe('sizing desk', () => {
  test('heater in SI units shows the engine figures', async ({ page }) => {
    await page.setViewportSize({ width: 1440, height: 900 });
    await openDesk(page);
    await fillHeater(page, siHeater);
    await expectHeaterFigures(page, heaterRequest(siHeater));
    await fullShot(page, 'desk-heater-1440.png');
    // "Copy summary" puts the engine's figures and the preliminary statement on the clipboard.
    await page.context().grantPermissions(['clipboard-read', 'clipboard-write']);
    await page.getByTestId('copy-summary').click();
    await expect(page.getByTestId('copy-summary-status')).toHaveText('Copied.');
    const summary = await page.evaluate(() => navigator.clipboard.readText());
    const r = calculate(heaterRequest(siHeater));
    if (r.service !== 'heater') throw new Error('heater expected');
    expect(summary).toContain(`Design heater duty: ${formatKw(r.heater.designDutyKw)} kW`);
    expect(summary).toContain(r.warnings.find((w) => w.code === 'preliminary')?.message ?? 'preliminary');
  });

  test('heater in US customary units shows the engine figures', async ({ page }) => {
    await page.setViewportSize({ width: 1024, height: 800 });
    await openDesk(page);
    await fillHeater(page, usHeater);
    await expectHeaterFigures(page, heaterRequest(usHeater), 'us');
    await fullShot(page, 'desk-heater-1024.png');
  });

  test('three-stage nitrogen compressor in US customary units', async ({ page }) => {
    // Two full passes (fill, then reopen the share link), each waiting for real-gas figures.
    test.setTimeout(150_000);
    await page.setViewportSize({ width: 1024, height: 800 });
    await openDesk(page);
    await fillCompressor(page, usCompressor);
    await expectCompressorFigures(page, compressorRequest(usCompressor), 'us');
    await fullShot(page, 'desk-compressor-1024.png');
    // The share link reopens the same inputs, and so the same figures.
    const link = await page.getByTestId('share-link').inputValue();
    expect(new URL(link).pathname).toBe('/size');
    await openDesk(page, link);
    await expect(page.getByTestId('desk-notices')).toContainText('shared link');
    await expect(page.getByTestId('field-flow-unit')).toHaveValue('SCFM');
    await expectCompressorFigures(page, compressorRequest(usCompressor), 'us');
  });

  test('three-stage nitrogen compressor in SI units', async ({ page }) => {
    await page.setViewportSize({ width: 1440, height: 900 });
    await openDesk(page);
    await fillCompressor(page, siCompressor);
    await expectCompressorFigures(page, compressorRequest(siCompressor), 'si');
    await fullShot(page, 'desk-compressor-1440.png');
  });

  test("invalid entries show the field's message and no result", async ({ page }) => {
    await page.setViewportSize({ width: 1440, height: 900 });
    await openDesk(page);
    await fillHeater(page, siHeater);
    await waitReady(page);
    await page.getByTestId('field-heatLossPercent').fill('60');
    await page.getByTestId('field-flow').fill('-5');
    await expect(page.getByTestId('error-heatLossPercent')).toContainText('Heat loss');
    await expect(page.getByTestId('error-heatLossPercent')).toContainText('from 0 to 50 %');
    await expect(page.getByTestId('error-flow')).toContainText('Flow');
    await expect(page.getByTestId('error-flow')).toContainText('above 0');
    await expect(page.getByTestId('result-panel')).toHaveAttribute('data-state', 'invalid');
    await expect(page.getByTestId('result-design-duty-kw')).toHaveCount(0);
    await expect(page.getByTestId('result-details')).toHaveCount(0);
    await expect(page.getByTestId('step-link-5')).toHaveAttribute('data-state', 'attention');
    await fullShot(page, 'desk-invalid-1440.png');
    // The calculator's own physical check (outlet below inlet) comes back onto the field too.
    await page.getByTestId('field-heatLossPercent').fill('5');
    await page.getByTestId('field-flow').fill('2');
    await page.getByTestId('field-outletTemperature').fill('10');
    await expect(page.getByTestId('result-panel')).toHaveAttribute('data-state', 'error');
    await expect(page.getByTestId('error-outletTemperature')).toContainText('Outlet temperature');
    await expect(page.getByTestId('error-outletTemperature')).toContainText('above the inlet');
    await expect(page.getByTestId('result-design-duty-kw')).toHaveCount(0);
    await page.getByTestId('field-outletTemperature').fill('320');
    await expectHeaterFigures(page, heaterRequest(siHeater));
  });

  test('switching units keeps the physical value', async ({ page }) => {
    await openDesk(page);
    await fillHeater(page, siHeater);
    await waitReady(page);
    const duty = await page.getByTestId('result-design-duty-kw').textContent();
    await page.getByTestId('field-flow-unit').selectOption('lb/h');
    expect(Number(await page.getByTestId('field-flow').inputValue())).toBeCloseTo(
      convertQuantity('flow', 2, 't/h', 'lb/h'),
      2,
    );
    await page.getByTestId('field-flow-unit').selectOption('t/h');
    await expect(page.getByTestId('field-flow')).toHaveValue('2');
    await page.getByTestId('field-inlet-pressure-unit').selectOption('kPa');
    expect(Number(await page.getByTestId('field-inlet-pressure').inputValue())).toBeCloseTo(
      convertQuantity('pressure', 3, 'barg', 'kPa', { barometricPressurePa: 101_325 }),
      6,
    );
    await page.getByTestId('field-inlet-pressure-unit').selectOption('barg');
    await expect(page.getByTestId('field-inlet-pressure')).toHaveValue('3');
    await page.getByTestId('field-inlet-temperature-unit').selectOption('degF');
    expect(Number(await page.getByTestId('field-inlet-temperature').inputValue())).toBeCloseTo(
      convertQuantity('temperature', 15, 'degC', 'degF'),
      6,
    );
    await page.getByTestId('field-inlet-temperature-unit').selectOption('degC');
    // The whole desk to US customary and back: units change, the duty does not.
    await page.getByTestId('unit-system-us').check();
    await expect(page.getByTestId('field-outletTemperature-unit')).toHaveValue('degF');
    await expect(page.getByTestId('field-inlet-pressure-unit')).toHaveValue('psig');
    expect(Number(await page.getByTestId('field-outletTemperature').inputValue())).toBeCloseTo(
      convertQuantity('temperature', 320, 'degC', 'degF'),
      4,
    );
    await waitReady(page);
    await expect(page.getByTestId('result-design-duty-kw')).toHaveText(duty ?? '');
    await page.getByTestId('unit-system-si').check();
    await expect(page.getByTestId('field-outletTemperature')).toHaveValue('320');
    await expect(page.getByTestId('field-inlet-pressure')).toHaveValue('3');
  });

  test('a sales engineer saves a sizing to an account and finds it in the list', async ({ page }) => {
    await page.setViewportSize({ width: 1440, height: 900 });
    await signIn(page, 'ines.marlow@halvard.example');
    await openDesk(page);
    await chooseAccount(page.getByTestId('field-accountId'), 'Tarnside Polymers');
    await fillHeater(page, siHeater);
    // The account's site pressure was replaced above; the engine figures follow the form.
    await expectHeaterFigures(page, heaterRequest(siHeater));
    const title = `Desk journey preheater ${Date.now()}`;
    await page.getByTestId('save-title').fill(title);
    await page.getByTestId('save-tag').fill('E-4410');
    await page.getByTestId('save-notes').fill('Sized on the desk by the browser journey.');
    await expect(page.getByTestId('save-account-name')).toHaveText('Tarnside Polymers');
    await fullShot(page, 'desk-save-1440.png');
    await page.getByTestId('save-submit').click();
    await expect(page.getByTestId('save-success')).toBeVisible();
    await page.getByTestId('saved-sizing-link').click();
    await expect(page.getByRole('heading', { level: 1 })).toHaveText(title);
    await page.goto('/sizings');
    await expect(page.getByTestId('sizings-table')).toContainText(title);
    await expect(page.getByTestId('sizings-table')).toContainText('E-4410');
  });

  test('a signed-out prospect sees results and is invited to sign in to save', async ({ page }) => {
    await page.setViewportSize({ width: 1024, height: 800 });
    await openDesk(page);
    await fillHeater(page, siHeater);
    await expectHeaterFigures(page, heaterRequest(siHeater));
    await expect(page.getByTestId('save-panel')).toHaveCount(0);
    const invite = page.getByTestId('sign-in-to-save');
    await expect(invite).toHaveText('Sign in to save this sizing');
    const href = (await invite.getAttribute('href')) ?? '';
    const next = new URL(href, 'http://x').searchParams.get('next') ?? '';
    expect(next.startsWith('/size?i=')).toBe(true);
    await fullShot(page, 'desk-prospect-1024.png');
    // Signing in brings the same inputs back, ready to save to the customer's own account.
    await invite.click();
    await page.waitForURL((url) => url.pathname === '/sign-in');
    await submitSignIn(page, 'olu.bennet@tarnside.example');
    await page.waitForURL((url) => url.pathname === '/size' && url.searchParams.has('i'));
    await expect(page.getByTestId('sizing-desk')).toHaveAttribute('data-hydrated', 'true');
    await expect(page.getByTestId('field-flow')).toHaveValue('2');
    await expect(page.getByTestId('field-flow-unit')).toHaveValue('t/h');
    await expect(page.getByTestId('fixed-account')).toHaveText('Tarnside Polymers');
    await expectHeaterFigures(page, heaterRequest(siHeater));
    await expect(page.getByTestId('save-submit')).toBeEnabled();
  });
});
