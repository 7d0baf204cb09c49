// Retries an assertion until it passes or the time runs out, then throws its last failure.
// A one-shot read races a screen that is still updating (a status that turns from Draft to Assessed a moment after
// its panel appears); jest's expect has no retrying matchers for playwright-core locators, so this plays their part.
// Free of the browser, so server tests that wait on another process's notification use it too.
const DEFAULT_TIMEOUT_MS = 30_000;
const RETRY_INTERVAL_MS = 200;

export async function eventually(check: () => void | Promise<void>, timeoutMs = DEFAULT_TIMEOUT_MS): Promise<void> {
  const deadline = Date.now() + timeoutMs;
  for (;;) {
    try {
      await check();
      return;
    } catch (error) {
      if (Date.now() >= deadline) throw error;
    }
    await new Promise((resolve) => setTimeout(resolve, RETRY_INTERVAL_MS));
  }
}
