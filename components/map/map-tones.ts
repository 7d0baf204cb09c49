// Colours of the highlight tones, from the theme's map block.
import { mapColors } from '@/constants/theme';
import type { HighlightTone } from '@/components/map/map-highlight';

export const TONE_COLOURS: Record<HighlightTone, string> = {
  placement: mapColors.tonePlacement,
  window: mapColors.toneWindow,
  alternative: mapColors.toneAlternative,
};

export const TONE_LABELS: Record<HighlightTone, string> = {
  placement: 'Placement',
  window: 'In the window',
  alternative: 'Alternative',
};
