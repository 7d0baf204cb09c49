// The kinds of rows a demo removal counts, in people's words, singular and plural.
import type { DemoDataCounts, DemoDataKind } from '@/shared/demo-data';

const KIND_WORDS: Record<DemoDataKind, [string, string]> = {
  sites: ['site', 'sites'],
  spans: ['span', 'spans'],
  tenants: ['tenant', 'tenants'],
  slices: ['slice', 'slices'],
  placements: ['placement revision', 'placement revisions'],
  windows: ['maintenance window', 'maintenance windows'],
  plans: ['move plan run', 'move plan runs'],
  notices: ['tenant notice', 'tenant notices'],
  signoffs: ['sign-off decision', 'sign-off decisions'],
  accounts: ['demo account', 'demo accounts'],
  networkOutline: ['map name and outline', 'map names and outlines'],
  demoSignOn: ['single sign-on set-up', 'single sign-on set-ups'],
};

/** "45 sites", "1 tenant", … for each kind with rows, in the order of the counts. */
export function countLines(counts: DemoDataCounts): { kind: DemoDataKind; text: string }[] {
  return (Object.keys(KIND_WORDS) as DemoDataKind[])
    .filter((kind) => counts[kind] > 0)
    .map((kind) => {
      const n = counts[kind];
      if (kind === 'networkOutline') return { kind, text: 'the map name and outline' };
      if (kind === 'demoSignOn') return { kind, text: 'single sign-on through the local test issuer' };
      return { kind, text: `${n} ${KIND_WORDS[kind][n === 1 ? 0 : 1]}` };
    });
}
