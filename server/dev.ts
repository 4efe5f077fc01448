import { createServer } from 'vite';
import { boot } from './boot';
import { readConfig } from './config';
import { createLogger } from './logger';

// `npm run dev`: the API on API_PORT (3001) and Vite's dev server with hot reload on PORT (3000),
// which forwards /api and /auth to the API (see vite.config.ts).
const log = createLogger(process.env.LOG_LEVEL ?? 'info');
const apiPort = Number(process.env.API_PORT ?? 3001);
const config = readConfig({ ...process.env, PORT: String(apiPort), HOST: '127.0.0.1' });
const api = await boot(config, log);
const vite = await createServer({ server: { port: Number(process.env.PORT ?? 3000) } });
await vite.listen();
vite.printUrls();
log.info({ apiPort: api.port }, 'API ready behind the dev server');
