import { Locator, Page } from 'playwright-core';

/** A small phone's screen, as the phone checks use it. */
export const PHONE = { width: 375, height: 740 };

/** How wide the page is: no wider than the phone means nothing scrolls sideways. */
export const pageWidth = (page: Page) => page.evaluate(() => document.documentElement.scrollWidth);

/** No transition or animation is running (a tab body sliding in sits off screen until it ends). */
export async function settled(page: Page): Promise<void> {
  // A spinner runs for ever and moves nothing: only animations that end are waited for.
  await page.waitForFunction(() =>
    document.getAnimations().every((animation) => animation.playState !== 'running' || animation.effect?.getTiming().iterations === Infinity),
  );
}

/**
 * The element lies inside the phone's screen from left to right once scrolled to by page scrolling alone:
 * every sideways scroller around it is put back at its start, as a person who scrolls only down sees it.
 */
export async function inSight(element: Locator): Promise<boolean> {
  await settled(element.page());
  await element.evaluate((target) => {
    target.scrollIntoView({ block: 'center' });
    for (let around = target.parentElement; around; around = around.parentElement) around.scrollLeft = 0;
  });
  const box = await element.boundingBox();
  return !!box && box.x >= 0 && box.x + box.width <= PHONE.width;
}
