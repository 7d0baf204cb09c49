// Anchor check: a function anchored to a site must sit there; one anchored to a point must stay within its radius.
import { greatCircleKm } from '../geo/great-circle';
import type { AnchorInfo, NetworkModel } from './types';

export function satisfiesAnchor(network: NetworkModel, anchor: AnchorInfo | undefined, site: number): boolean {
  if (anchor === undefined) return true;
  if ('site' in anchor) return anchor.site === site;
  const s = network.sites[site];
  if (s === undefined) return false;
  return greatCircleKm(s, anchor) <= anchor.radiusKm;
}
