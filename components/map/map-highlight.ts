// Decides how each element is drawn under up to two highlights: bold in a tone, normal, or dimmed.
export type HighlightTone = 'placement' | 'window' | 'alternative';

export type MapHighlight = { sites?: readonly string[]; spans?: readonly string[]; tone?: HighlightTone };

export type ElementEmphasis = { dimmed: boolean; tone: HighlightTone | null };

export type EmphasisLookup = { site: (id: string) => ElementEmphasis; span: (id: string) => ElementEmphasis };

const PLAIN: ElementEmphasis = { dimmed: false, tone: null };

function hasElements(h: MapHighlight | undefined): h is MapHighlight {
  return !!h && ((h.sites?.length ?? 0) > 0 || (h.spans?.length ?? 0) > 0);
}

/**
 * With no highlight every element is plain. Otherwise an element in the primary highlight takes its tone
 * (default `placement`), one only in the secondary takes the secondary's tone (default `window`), and the rest are dimmed.
 */
export function emphasisFor(primary?: MapHighlight, secondary?: MapHighlight): EmphasisLookup {
  const layers = [
    hasElements(primary) ? { h: primary, tone: primary.tone ?? 'placement' } : null,
    hasElements(secondary) ? { h: secondary, tone: secondary.tone ?? 'window' } : null,
  ].filter((l): l is { h: MapHighlight; tone: HighlightTone } => l !== null);
  if (layers.length === 0) return { site: () => PLAIN, span: () => PLAIN };

  const siteTones = new Map<string, HighlightTone>();
  const spanTones = new Map<string, HighlightTone>();
  // Reverse order so the primary layer writes last and wins where both name an element.
  for (const { h, tone } of [...layers].reverse()) {
    h.sites?.forEach((id) => siteTones.set(id, tone));
    h.spans?.forEach((id) => spanTones.set(id, tone));
  }
  const look = (tones: Map<string, HighlightTone>) => (id: string): ElementEmphasis => {
    const tone = tones.get(id);
    return tone ? { dimmed: false, tone } : { dimmed: true, tone: null };
  };
  return { site: look(siteTones), span: look(spanTones) };
}
