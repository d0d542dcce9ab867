/** Starts one stateless server process: all state lives in PostgreSQL. */
import { createDatabase } from '@/db/client';
import { createApp } from './app';
import { createAuth } from './auth';
import { loadEnv } from './env';
import { createMailer } from './mail/mailer';

const env = loadEnv();
const db = createDatabase(env.DATABASE_URL);
const mailer = createMailer({ host: env.SMTP_HOST, port: env.SMTP_PORT, from: env.MAIL_FROM });
const app = createApp({ env, db, auth: createAuth(env, db, mailer), mailer });

const server = app.listen(env.PORT, env.HOST, (err?: Error) => {
  // Express 5 hands listen errors such as EADDRINUSE to this callback.
  if (err) {
    console.error(`[server] cannot listen on ${env.HOST}:${env.PORT}: ${err.message}`);
    process.exit(1);
  }
  console.log(`[server] Nightloom on ${env.BASE_URL}`);
});

function shutdown() {
  server.close(() => {
    mailer.close();
    void db.$client.end().then(() => process.exit(0));
  });
  setTimeout(() => process.exit(0), 5_000).unref();
}
process.on('SIGINT', shutdown);
process.on('SIGTERM', shutdown);
