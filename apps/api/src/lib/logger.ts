/** One-line JSON logs on stdout/stderr; quiet under test unless TAKEUP_LOG is set. */
type Level = "info" | "warn" | "error";
const silent = process.env.NODE_ENV === "test" && !process.env.TAKEUP_LOG;

function write(level: Level, message: string, fields?: Record<string, unknown>) {
  if (silent && level !== "error") return;
  const line = JSON.stringify({ level, at: new Date().toISOString(), message, ...fields });
  (level === "info" ? process.stdout : process.stderr).write(`${line}\n`);
}

export const logger = {
  info: (message: string, fields?: Record<string, unknown>) => write("info", message, fields),
  warn: (message: string, fields?: Record<string, unknown>) => write("warn", message, fields),
  error: (message: string, fields?: Record<string, unknown>) => write("error", message, fields),
};
export type Logger = typeof logger;
