/**
 * Resolve when the page has finished computing (body data-state no longer "computing"), so the report
 * reads the results of the design on screen and not those of the one before an edit.
 */
export function waitForPage(computing: () => boolean): Promise<void> {
  if (!computing()) return Promise.resolve();
  return new Promise((resolve) => {
    const observer = new MutationObserver(() => {
      if (computing()) return;
      observer.disconnect();
      resolve();
    });
    observer.observe(document.body, { attributes: true, attributeFilter: ['data-state'] });
  });
}
