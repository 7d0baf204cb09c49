// A short, human label for a User-Agent header ("Firefox on Linux"), kept with a session for its owner's list.

const BROWSERS: [RegExp, string][] = [
  [/Edg\//, 'Edge'], [/OPR\/|Opera/, 'Opera'], [/Firefox\//, 'Firefox'], [/Chrome\/|CriOS\//, 'Chrome'],
  [/Safari\//, 'Safari'], [/curl\//, 'curl'], [/node|undici|axios/i, 'Script'],
];
const SYSTEMS: [RegExp, string][] = [
  [/Android/, 'Android'], [/iPhone|iPad|iOS/, 'iOS'], [/Windows/, 'Windows'], [/Mac OS X|Macintosh/, 'macOS'],
  [/CrOS/, 'ChromeOS'], [/Linux/, 'Linux'],
];
const MAX_LABEL_CHARS = 60;

/** Browser and system when recognised, else the header's first word (cut short); null without a header. */
export function userAgentLabel(header: string | undefined): string | null {
  const ua = header?.trim();
  if (!ua) return null;
  const browser = BROWSERS.find(([pattern]) => pattern.test(ua))?.[1];
  const system = SYSTEMS.find(([pattern]) => pattern.test(ua))?.[1];
  if (browser && system) return `${browser} on ${system}`;
  if (browser ?? system) return (browser ?? system)!;
  return ua.split(/\s/)[0].slice(0, MAX_LABEL_CHARS);
}

/** The client address as people read it: IPv4 without the IPv6-mapped prefix. */
export function displayAddress(ip: string | undefined): string | null {
  if (!ip) return null;
  return ip.startsWith('::ffff:') ? ip.slice('::ffff:'.length) : ip;
}
