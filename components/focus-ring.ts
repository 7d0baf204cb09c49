// Keyboard focus ring: native platforms draw their own focus, so there is nothing to install there.
// The web version (focus-ring.web.ts) adds the ring as one global style rule.

/** Installs the app-wide focus ring; a no-op outside the web. */
export function installFocusRing(): void {}
