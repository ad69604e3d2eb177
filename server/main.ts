import pino from 'pino';
import { createApp } from './app';
import { loadConfig } from './config';
import { createDb } from './db';
import { installProcessSafetyNet } from './errors/process-safety-net';

/** Runs the server alone against an already prepared database (`npm start` does the preparing). */
async function main(): Promise<void> {
  const config = loadConfig();
  const logger = pino({ level: config.logLevel });
  installProcessSafetyNet(logger);
  const db = createDb(config.db);
  const { app, close } = createApp({ config, db, logger, runScheduler: true });
  const server = app.listen(config.port, config.host, () => {
    console.log(`Commonwort is listening on ${config.publicUrl}`);
  });
  const shutdown = () => {
    server.close(() => {
      close();
      void db.destroy().then(() => process.exit(0));
    });
    server.closeAllConnections();
  };
  process.on('SIGINT', shutdown);
  process.on('SIGTERM', shutdown);
}

void main().catch((error) => {
  console.error(error instanceof Error ? error.message : error);
  process.exit(1);
});
