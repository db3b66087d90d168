// Functions the browser bench runs inside the page (Playwright serialises them, so each is self-contained and
// declares no named helpers). Times are the page's own clock: an event's timeStamp and performance.now() share
// the navigation's time origin, so nothing here waits on Playwright's polling.

export type PaintProbe = { lcpMs: number; element: string; ttfbMs: number; fcpMs: number; domContentLoadedMs: number };
/** A timed change: `ms` from the user's event, `at` the page time the change was seen. */
export type Change = { ms: number; at: number; before: string; after: string };

/** Largest Contentful Paint so far (buffered entries), the element it painted, and the navigation's milestones. */
export function readPaint(): Promise<PaintProbe> {
  return new Promise((resolve, reject) => {
    const nav = performance.getEntriesByType('navigation')[0] as PerformanceNavigationTiming | undefined;
    const observer = new PerformanceObserver((list) => {
      const last = list.getEntries().at(-1) as (PerformanceEntry & { element?: Element | null }) | undefined;
      if (!last) return;
      observer.disconnect();
      const el = last.element;
      const text = (el?.textContent ?? '').replace(/\s+/g, ' ').trim().slice(0, 48);
      resolve({
        lcpMs: last.startTime,
        element: el ? `<${el.tagName.toLowerCase()}> "${text}"` : 'element removed since',
        ttfbMs: nav?.responseStart ?? NaN,
        fcpMs: performance.getEntriesByName('first-contentful-paint')[0]?.startTime ?? NaN,
        domContentLoadedMs: nav?.domContentLoadedEventEnd ?? NaN,
      });
    });
    observer.observe({ type: 'largest-contentful-paint', buffered: true });
    setTimeout(() => reject(new Error('no largest-contentful-paint entry within 5 s')), 5_000);
  });
}

type KeystrokeArgs = { field: HTMLInputElement; figure: Element; region: Element };

/**
 * Arms a watch for the next keystroke in `field`: from that input event's timestamp to the first DOM change after
 * which `figure` reads differently. Resolves with the old and new text so the caller can check the new value.
 */
export function armKeystroke({ field, figure, region }: KeystrokeArgs): void {
  const before = figure.textContent ?? '';
  let typedAt = NaN;
  field.addEventListener('input', (e) => (typedAt = e.timeStamp), { once: true, capture: true });
  (window as unknown as { benchChange: Promise<Change> }).benchChange = new Promise((resolve, reject) => {
    const observer = new MutationObserver(() => {
      const now = performance.now();
      const after = figure.textContent ?? '';
      if (Number.isNaN(typedAt) || after === before) return;
      observer.disconnect();
      resolve({ ms: now - typedAt, at: now, before, after });
    });
    observer.observe(region, { subtree: true, childList: true, characterData: true });
    setTimeout(() => reject(new Error(`the headline still read ${before} 10 s after the keystroke`)), 10_000);
  });
}

type SwitchArgs = { control: HTMLInputElement; field: HTMLInputElement; unit: HTMLSelectElement };

/**
 * Arms a watch for a click on the unit-system `control`: from that click's timestamp to the first DOM change after
 * which the flow field shows a converted number in another unit (React commits the whole switch at once).
 */
export function armUnitSwitch({ control, field, unit }: SwitchArgs): void {
  const before = `${field.value} ${unit.value}`;
  let clickedAt = NaN;
  control.addEventListener('click', (e) => (clickedAt = e.timeStamp), { once: true, capture: true });
  (window as unknown as { benchChange: Promise<Change> }).benchChange = new Promise((resolve, reject) => {
    const observer = new MutationObserver(() => {
      const now = performance.now();
      const after = `${field.value} ${unit.value}`;
      if (Number.isNaN(clickedAt) || unit.value === before.split(' ')[1] || field.value === before.split(' ')[0])
        return;
      observer.disconnect();
      resolve({ ms: now - clickedAt, at: now, before, after });
    });
    observer.observe(document.body, { subtree: true, childList: true, characterData: true, attributes: true });
    setTimeout(() => reject(new Error(`the flow field still read ${before} 5 s after the click`)), 5_000);
  });
}

/** The change an armed probe saw. */
export function awaitChange(): Promise<Change> {
  return (window as unknown as { benchChange: Promise<Change> }).benchChange;
}
