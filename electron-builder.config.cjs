// Packaging settings for `npm run dist` (electron-builder). Run it on a machine with internet access:
// electron-builder downloads the Electron runtime for each target, which this offline machine cannot.
// The app ships only what `npm run build` wrote to out/ plus package.json; every dependency is bundled
// into out/main/main.cjs, so no node_modules are copied ('!node_modules…' below: electron is an optional
// dependency, which electron-builder would otherwise count as a production module and copy).
const { optionalDependencies } = require('./package.json');

/** @type {import('electron-builder').Configuration} */
module.exports = {
  appId: 'org.wattledger.desktop',
  productName: 'WattLedger',
  copyright: 'Copyright © WattLedger founding engineers',
  electronVersion: optionalDependencies.electron,
  // assets/build/icon.png (1024 px, rendered from icon.svg by `npm run icon`) is the icon for every target.
  directories: { output: 'dist', buildResources: 'assets/build' },
  files: ['out/main/**/*', 'out/preload/**/*', 'out/renderer/**/*', '!out/**/*.map', 'package.json', '!node_modules{,/**/*}'],
  extraMetadata: { main: 'out/main/main.cjs' },
  asar: true,
  // Dependencies are bundled by Vite; nothing native to rebuild.
  npmRebuild: false,
  // Electron fuses: switch off what a desktop calculator never needs and an attacker could use.
  electronFuses: {
    runAsNode: false,
    enableCookieEncryption: true,
    enableNodeOptionsEnvironmentVariable: false,
    enableNodeCliInspectArguments: false,
    enableEmbeddedAsarIntegrityValidation: true,
    onlyLoadAppFromAsar: true,
    grantFileProtocolExtraPrivileges: false,
  },
  linux: {
    target: ['AppImage', 'deb'],
    category: 'Science',
    synopsis: 'Loss and thermal budget for buck and boost DC-DC converters',
    maintainer: 'WattLedger team <team@wattledger.invalid>',
  },
  deb: { priority: 'optional' },
  win: { target: ['nsis'] },
  nsis: { oneClick: false, perMachine: false, allowToChangeInstallationDirectory: true },
  mac: { target: ['dmg'], category: 'public.app-category.developer-tools', hardenedRuntime: true },
};
