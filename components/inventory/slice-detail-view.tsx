// One slice: who owns it and what service it is, the caution when critical, where it runs (map, functions,
// ties with their paths) and its placement history.
import { useMemo } from 'react';
import type { SliceDetail } from '@/shared/inventory';
import { Badge, CriticalBadge } from '@/components/inventory/badges';
import { CriticalCaution } from '@/components/critical-caution';
import { DetailFrame, Facts, Section } from '@/components/inventory/detail-frame';
import { formatCpu, formatGbps, formatSnssai, sstName } from '@/components/inventory/format';
import { InventoryMap } from '@/components/inventory/inventory-map';
import { placementElements } from '@/components/inventory/placement-diff';
import { SliceFunctions } from '@/components/inventory/slice-functions';
import { SliceHistory } from '@/components/inventory/slice-history';
import { SliceTies } from '@/components/inventory/slice-ties';
import { useSiteNames } from '@/components/inventory/use-site-names';

export function SliceDetailView({ detail }: { detail: SliceDetail }) {
  const { slice, functions, ties, history } = detail;
  const known = useMemo(() => functions.map((f) => ({ id: f.siteId, name: f.siteName })), [functions]);
  const siteName = useSiteNames(known);
  const current = history.find((rev) => rev.current);
  const highlight = useMemo(() => (current ? placementElements(current.sites, current.paths) : { sites: [], spans: [] }), [current]);
  return (
    <DetailFrame
      testID="slice-detail"
      kicker={slice.tenantName}
      title={slice.name}
      backHref="/slices"
      backLabel="Slices"
      badges={
        <>
          <Badge label={sstName(slice.sst)} tone="primary" testID="slice-sst" />
          <Badge label={`S-NSSAI ${formatSnssai(slice.sst, slice.sd)}`} />
          <Badge label={`Priority ${slice.priority}`} />
          {slice.critical ? <CriticalBadge /> : null}
          {slice.status !== 'active' ? <Badge label={slice.status} /> : null}
        </>
      }
    >
      {slice.critical ? (
        <CriticalCaution
          testID="critical-caution"
          title="Critical service"
          lead="This slice carries a public-safety, health or utility service. Before any work that touches it:"
        />
      ) : null}
      <Facts
        items={[
          { label: 'Functions', value: String(slice.functionCount) },
          { label: 'Compute', value: formatCpu(slice.cpu) },
          { label: 'Ties', value: String(slice.tieCount) },
          { label: 'Bandwidth', value: formatGbps(slice.bandwidthGbps) },
          { label: 'Placement', value: slice.revision === null ? 'not placed' : `revision ${slice.revision}` },
        ]}
      />
      <Section title="Current placement" testID="slice-placement">
        {current ? <InventoryMap compact highlight={{ ...highlight, tone: 'placement' }} /> : null}
      </Section>
      <Section title={`Functions (${functions.length})`}>
        <SliceFunctions functions={functions} siteName={siteName} />
      </Section>
      <Section title={`Ties (${ties.length})`}>
        <SliceTies ties={ties} functions={functions} siteName={siteName} />
      </Section>
      <Section title="Placement history">
        <SliceHistory history={history} siteName={siteName} />
      </Section>
    </DetailFrame>
  );
}
