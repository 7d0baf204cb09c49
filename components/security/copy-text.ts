// Copies text to the clipboard where the platform offers one (browsers); false when it cannot, so the screen can
// ask the person to select and copy the text by hand.
export async function copyText(text: string): Promise<boolean> {
  const clipboard = (globalThis as { navigator?: { clipboard?: { writeText?: (t: string) => Promise<void> } } }).navigator?.clipboard;
  if (!clipboard?.writeText) return false;
  try {
    await clipboard.writeText(text);
    return true;
  } catch {
    return false;
  }
}

/** The same address with the webcal scheme, which opens the system's calendar app on a subscription prompt. */
export function webcalAddress(url: string): string {
  return url.replace(/^https?:/, 'webcal:');
}
