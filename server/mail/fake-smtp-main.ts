/** Runs the local SMTP fake as its own process (started by `npm start`). */
import { createDatabase } from '@/db/client';
import { loadEnv } from '@/server/env';
import { startFakeSmtp } from './fake-smtp';

const env = loadEnv();
const db = createDatabase(env.DATABASE_URL, 2);
startFakeSmtp(db, env.SMTP_PORT, env.SMTP_HOST)
  .then((smtp) => {
    console.log(`[mail] SMTP fake listening on ${env.SMTP_HOST}:${smtp.port}`);
    const stop = () => void smtp.close().then(() => db.$client.end()).then(() => process.exit(0));
    process.on('SIGINT', stop);
    process.on('SIGTERM', stop);
  })
  .catch((err: Error) => {
    console.error('[mail] SMTP fake failed to start:', err.message);
    process.exit(1);
  });
