// The month view of the date picker, loaded when a date picker first opens: react-native-calendars brings moment,
// lodash and xdate (about 350 KB of script before compression), and in the web app's own chunk no screen's first
// load carries them. Rendered inside a Suspense boundary (components/date-time-picker.tsx).
import { lazy } from 'react';

export const PickerMonth = lazy(() => import('react-native-calendars').then((module) => ({ default: module.Calendar })));
