// `server-only` for scripts run with tsx (see scripts/tsconfig.json): the real package throws
// outside React's react-server condition, which tsx does not set. Next keeps using the real one.
export {};
