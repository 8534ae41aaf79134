/**
 * Command-line flags for Debian's Chromium run headless by the browser tests and the Lighthouse
 * measurement: no sandbox (it runs as root in a container), no GPU, and no QUIC, first-run screens,
 * background downloads, component updates or sync, so nothing but the page under test uses the
 * network or the two cores.
 */
export const CHROMIUM_FLAGS = [
  "--no-sandbox",
  "--disable-gpu",
  "--disable-quic",
  "--no-first-run",
  "--disable-background-networking",
  "--disable-component-update",
  "--disable-sync",
];
