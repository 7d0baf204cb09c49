// Keys for the Idempotency-Key header: one per intended action, so a retry or a double submit of it is
// recognised by the server and does the action once. Only uniqueness matters (they are not secrets).
export function newIdempotencyKey(): string {
  const c = globalThis.crypto as Crypto | undefined;
  if (typeof c?.randomUUID === 'function') return c.randomUUID();
  if (typeof c?.getRandomValues === 'function') {
    return Array.from(c.getRandomValues(new Uint8Array(16)), (b) => b.toString(16).padStart(2, '0')).join('');
  }
  // No Web Crypto (older Hermes builds): time plus Math.random is unique enough among one person's bookings.
  return `${Date.now().toString(36)}-${Math.random().toString(36).slice(2)}-${Math.random().toString(36).slice(2)}`;
}
