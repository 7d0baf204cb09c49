// Site glyphs by kind (filled by compute load), tone halos, name labels for the bigger sites, and 44 px tap circles.
// Pointer only and hidden from assistive technology with the rest of the drawing: the list beside the map
// (map-element-list.tsx) names each site with its load.
import { Circle, G, Path, Text as SvgText } from 'react-native-svg';
import { utilisationColour } from '@/components/map/colour-scale';
import type { PlacedSite } from '@/components/map/map-geometry';
import type { EmphasisLookup } from '@/components/map/map-highlight';
import type { MapSiteKind } from '@/components/map/map-types';
import { labelAnchor, type LabelSide } from '@/components/map/map-labels';
import { GLYPH_RADIUS_PX, glyphPath, KIND_ORDER } from '@/components/map/site-glyphs';
import { TONE_COLOURS } from '@/components/map/map-tones';
import { fonts, MAP_DIMMED_OPACITY, mapColors } from '@/constants/theme';

/** Radius of the invisible tap circle: 44 px across, the smallest comfortable finger target. */
export const SITE_HIT_RADIUS_PX = 22;

type Props = {
  sites: readonly PlacedSite[];
  emphasis: EmphasisLookup;
  selectedId: string | null;
  compact: boolean;
  /** Sites whose names are printed, and on which side (see map-labels.ts). */
  labelled: ReadonlyMap<string, LabelSide>;
  onPress: (id: string) => void;
};

export function siteRadiusPx(kind: MapSiteKind, compact: boolean, toned: boolean): number {
  return GLYPH_RADIUS_PX[kind] * (compact ? 0.8 : 1) * (toned ? 1.2 : 1);
}

// Smallest sites last, so a cell site beside a core site stays tappable.
const drawOrder = (a: PlacedSite, b: PlacedSite) => KIND_ORDER.indexOf(a.kind) - KIND_ORDER.indexOf(b.kind);

export function MapSiteLayer({ sites, emphasis, selectedId, compact, labelled, onPress }: Props) {
  const ordered = [...sites].sort(drawOrder);
  return (
    <G>
      {ordered.map((site) => {
        const { dimmed, tone } = emphasis.site(site.id);
        const r = siteRadiusPx(site.kind, compact, tone !== null);
        const selected = selectedId === site.id;
        return (
          <G
            key={site.id}
            testID={`map-site-${site.id}`}
            opacity={dimmed ? MAP_DIMMED_OPACITY : 1}
            onPress={() => onPress(site.id)}
          >
            {selected ? <Circle cx={site.x} cy={site.y} r={r + 6} fill={mapColors.selection} /> : null}
            {tone ? <Circle cx={site.x} cy={site.y} r={r + 5} fill={TONE_COLOURS[tone]} fillOpacity={0.4} /> : null}
            <Path
              d={glyphPath(site.kind, site.x, site.y, r)}
              fill={utilisationColour(site.cpuUtilisation)}
              stroke={tone ? TONE_COLOURS[tone] : mapColors.siteStroke}
              strokeWidth={tone ? 2 : 1.2}
            />
            {labelled.has(site.id) && (selected || !dimmed) ? (
              <SiteLabel id={site.id} name={site.name} {...labelAnchor(site, r, labelled.get(site.id)!)} />
            ) : null}
            <Circle cx={site.x} cy={site.y} r={SITE_HIT_RADIUS_PX} fill="transparent" />
          </G>
        );
      })}
    </G>
  );
}

// A halo of the land colour under the name keeps it readable across spans and coastline.
function SiteLabel({ id, name, x, y, anchor }: { id: string; name: string } & ReturnType<typeof labelAnchor>) {
  const common = { x, y, fontSize: 12, fontFamily: fonts.medium, textAnchor: anchor };
  return (
    <G testID={`map-label-${id}`}>
      <SvgText {...common} stroke={mapColors.labelHalo} strokeWidth={3} strokeLinejoin="round" fill={mapColors.labelHalo}>
        {name}
      </SvgText>
      <SvgText {...common} fill={mapColors.label}>
        {name}
      </SvgText>
    </G>
  );
}
