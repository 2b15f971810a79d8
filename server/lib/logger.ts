import { pino } from 'pino';
import type { Config } from '../config/env';

/** Tests are quiet unless TEST_LOG=1, which shows every request and any 500's stack while debugging. */
export const createLogger = (config: Pick<Config, 'logLevel' | 'env'>) =>
  pino({ level: config.env === 'test' && !process.env.TEST_LOG ? 'silent' : config.logLevel });
export type Logger = ReturnType<typeof createLogger>;
