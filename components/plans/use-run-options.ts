// What the run form can pin or leave out: the affected slices' functions (where they sit today) and the network's sites.
import { useMemo } from 'react';
import { useNetworkMapQuery } from '@/hooks/queries/network-map';
import { useWindowImpactQuery } from '@/hooks/queries/windows';
import type { PickOption } from '@/components/plans/pick-chips';
import { elementNames } from '@/components/plans/use-element-names';

type Placement = { slice: string; sites: Record<string, string> };

/** Pure so tests can check it: one option per function, labelled with the site it sits on. */
export function functionOptionsFrom(placements: readonly Placement[], siteName: (id: string) => string): PickOption[] {
  const options: PickOption[] = [];
  for (const placement of placements) {
    for (const [fn, site] of Object.entries(placement.sites)) options.push({ id: fn, label: `${fn} · ${siteName(site)}` });
  }
  return options.sort((a, b) => a.id.localeCompare(b.id));
}

export type RunOptions = { functionOptions: PickOption[]; siteOptions: PickOption[]; loadingFunctions: boolean; loadingSites: boolean };

export function useRunOptions(windowId: string): RunOptions {
  const impact = useWindowImpactQuery(windowId);
  const map = useNetworkMapQuery();
  return useMemo(() => {
    const names = elementNames(map.data);
    const siteOptions = [...(map.data?.sites ?? [])]
      .sort((a, b) => a.name.localeCompare(b.name))
      .map((s) => ({ id: s.id, label: s.name }));
    return {
      functionOptions: functionOptionsFrom(impact.data?.currentPaths ?? [], names.site),
      siteOptions,
      loadingFunctions: impact.isPending,
      loadingSites: map.isPending,
    };
  }, [impact.data, impact.isPending, map.data, map.isPending]);
}
