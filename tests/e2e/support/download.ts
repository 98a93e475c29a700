import type { Download, Page } from 'playwright-core';

/**
 * Runs `action` and resolves with the file Chromium downloaded because of it, whether the page
 * itself started the download or a tab it opened did (a short-lived link opened with
 * window.open is attributed to the new tab). Playwright keeps the file until the context closes.
 */
export async function captureDownload(page: Page, action: () => Promise<void>, timeout = 30_000): Promise<Download> {
  const context = page.context();
  let onPage: ((p: Page) => void) | undefined;
  const downloaded = new Promise<Download>((resolve, reject) => {
    const timer = setTimeout(() => reject(new Error(`No download within ${timeout} ms`)), timeout);
    const done = (d: Download): void => {
      clearTimeout(timer);
      resolve(d);
    };
    page.once('download', done);
    onPage = (p: Page): void => void p.once('download', done);
    context.on('page', onPage);
  });
  try {
    await action();
    return await downloaded;
  } finally {
    if (onPage) context.off('page', onPage);
  }
}
