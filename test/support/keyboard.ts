/** Keyboard helpers for browser tests: reach a control by Tab alone, as a keyboard user would. */
import type { Locator, Page } from 'playwright-core';

/** Press Tab until `target` has the focus (at most `limit` times); fails if it never does. */
export async function tabTo(page: Page, target: Locator, limit = 200): Promise<void> {
  for (let i = 0; i < limit; i += 1) {
    await page.keyboard.press('Tab');
    if (await target.evaluate((el) => el === document.activeElement)) return;
  }
  throw new Error(`Tab never reached ${target.toString()}`);
}
