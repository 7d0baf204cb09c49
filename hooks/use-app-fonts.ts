// Loads the four Work Sans weights the type ramp uses; per-weight imports ship only those four files.
import { useFonts } from 'expo-font';
import { WorkSans_400Regular } from '@expo-google-fonts/work-sans/400Regular';
import { WorkSans_500Medium } from '@expo-google-fonts/work-sans/500Medium';
import { WorkSans_600SemiBold } from '@expo-google-fonts/work-sans/600SemiBold';
import { WorkSans_700Bold } from '@expo-google-fonts/work-sans/700Bold';

/** True once the fonts are ready, or once loading failed: the app then runs on system fonts rather than not at all. */
export function useAppFonts(): boolean {
  const [loaded, error] = useFonts({ WorkSans_400Regular, WorkSans_500Medium, WorkSans_600SemiBold, WorkSans_700Bold });
  return loaded || error !== null;
}
