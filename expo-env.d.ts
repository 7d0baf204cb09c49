/// <reference types="expo/types" />

// Type references for Expo's globals (process.env.EXPO_*, asset imports); written by hand because the
// project is set up without a template. `expo start` may rewrite this file with the same content.
