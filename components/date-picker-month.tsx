// The month view of the date picker (react-native-calendars). On native the bundle holds everything anyway; the
// web sibling (date-picker-month.web.tsx) loads it on demand.
export { Calendar as PickerMonth } from 'react-native-calendars';
