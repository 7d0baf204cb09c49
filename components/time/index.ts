// Time-zone helpers shared by the calendar and window screens: pure functions on ISO instants and day keys.
export * from './zone-clock';
export * from './zoned-format';
export * from './day-segments';
export * from './month-grid';
