/** Polls a URL until it answers at all (any status), or fails after the timeout. */
export async function waitForHttp(url: string, timeoutMs = 60_000): Promise<void> {
  const deadline = Date.now() + timeoutMs;
  for (;;) {
    try {
      await fetch(url, { signal: AbortSignal.timeout(2_000) });
      return;
    } catch {
      if (Date.now() > deadline) throw new Error(`${url} did not answer within ${timeoutMs / 1000} s.`);
      await new Promise((r) => setTimeout(r, 200));
    }
  }
}
