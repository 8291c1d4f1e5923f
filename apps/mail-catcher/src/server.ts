import { startMailCatcher } from "./catcher.ts";

const catcher = await startMailCatcher({
  smtpPort: Number(process.env.SMTP_PORT ?? 1025),
  httpPort: Number(process.env.HTTP_PORT ?? 1080),
});
process.stdout.write(`mail catcher: SMTP on 127.0.0.1:${catcher.smtpPort}, messages at http://127.0.0.1:${catcher.httpPort}/messages\n`);
const stop = () => void catcher.close().then(() => process.exit(0));
process.on("SIGTERM", stop);
process.on("SIGINT", stop);
