// Babel for Metro and jest-expo. Metro would fall back to this preset on its own, but jest-expo's web preset
// hands babel-jest no preset when no config file exists, so the file must be here for the app tests.
module.exports = function babelConfig(api) {
  api.cache(true);
  return { presets: ['babel-preset-expo'] };
};
