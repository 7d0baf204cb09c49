// Time-zone helpers every screen uses: pure functions on ISO instants and day keys, the zone label, and (in
// use-viewer-time-zone and zoned-when, imported directly) the viewer's zone and the two-line time display.
export * from '@/shared/zone-clock';
export * from './zoned-format';
export * from './day-segments';
export * from './month-grid';
export * from './zone-label';
