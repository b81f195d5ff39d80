import pino from "pino";

/** The app's structured log (JSON lines on stdout). */
export const logger = pino({
  level: process.env.LOG_LEVEL ?? (process.env.NODE_ENV === "test" ? "warn" : "info"),
});
