// Stepped colour scale for utilisation (0 = idle, 1 = full): few, named bands read faster than a smooth ramp.
import { mapColors } from '@/constants/theme';

export type UtilisationBand = {
  index: number;
  /** Lower bound, inclusive (fraction of capacity). */
  from: number;
  /** Upper bound, exclusive; Infinity for the top band. */
  to: number;
  label: string;
  colour: string;
};

/**
 * Band edges as fractions of capacity. The first band sets apart what carries (almost) nothing, spare routes a
 * planner looks for; the top band means booked beyond capacity.
 */
export const UTILISATION_EDGES = [0.01, 0.3, 0.6, 0.8, 1] as const;

const LABELS = ['idle', '1–30 %', '30–60 %', '60–80 %', '80–100 %', 'over capacity'] as const;

export const UTILISATION_BANDS: readonly UtilisationBand[] = LABELS.map((label, index) => ({
  index,
  from: index === 0 ? 0 : UTILISATION_EDGES[index - 1],
  to: index < UTILISATION_EDGES.length ? UTILISATION_EDGES[index] : Infinity,
  label,
  colour: mapColors.utilisation[index],
}));

/** The band a utilisation falls in; negative figures count as idle. Null when there is no figure at all. */
export function utilisationBand(utilisation: number | null | undefined): UtilisationBand | null {
  if (utilisation == null || !Number.isFinite(utilisation)) return null;
  const index = UTILISATION_EDGES.findIndex((edge) => utilisation < edge);
  return UTILISATION_BANDS[index === -1 ? UTILISATION_BANDS.length - 1 : index];
}

/** Colour for a utilisation, grey when the figure is missing. */
export function utilisationColour(utilisation: number | null | undefined): string {
  return utilisationBand(utilisation)?.colour ?? mapColors.noFigure;
}

/** "64 %" for display; "—" without a figure. */
export function formatUtilisation(utilisation: number | null | undefined): string {
  if (utilisation == null || !Number.isFinite(utilisation)) return '—';
  return `${Math.round(utilisation * 100)} %`;
}
