import { existsSync } from 'node:fs';
import path from 'node:path';
import cookieParser from 'cookie-parser';
import express, { type Express } from 'express';
import type { Db } from './db/client';
import { authStore } from './features/auth/auth.repo';
import { authRouter, DEFAULT_SIGN_IN_LIMIT, type SignInLimit } from './features/auth/auth.routes';
import { createAuthService } from './features/auth/auth.service';
import { checkCsrf, loadSession, type CookiePolicy } from './features/auth/session.middleware';
import { createSessionTokens } from './features/auth/session-token';
import { healthRouter } from './features/health/health.routes';
import { recorderRepo } from './features/recorder/recorder.repo';
import { recorderRouter } from './features/recorder/recorder.routes';
import { createRecorder, type RecorderOptions } from './features/recorder/recorder.service';
import { recordingsStore } from './features/recordings/recordings.repo';
import { createRecordingsService } from './features/recordings/recordings.service';
import { recordingsRouter } from './features/recordings/recordings.routes';
import { notesRouter } from './features/notes/notes.routes';
import { cyclesRouter } from './features/cycles/cycles.routes';
import { storeCyclesOnFinish } from './features/cycles/cycles.service';
import { PANEL_BODY_LIMIT, panelsRouter } from './features/panels/panels.routes';
import { drillsRouter } from './features/drills/drills.routes';
import type { DevInbox } from './features/mail/fake-smtp';
import type { Mailer } from './features/mail/mailer';
import { robotProfileRepo } from './features/season/robot-profile.repo';
import { seasonRouter } from './features/season/season.routes';
import { createSeasonService } from './features/season/season.service';
import { teamStore } from './features/team/team.repo';
import { teamRouter } from './features/team/team.routes';
import { createTeamService } from './features/team/team.service';
import { AppError, errorHandler } from './lib/errors';
import type { Logger } from './lib/logger';
import { markRequestStart } from './lib/server-timing';
import { createRelay, type Relay, type RelayDeps } from './relay/relay-server';
import { relayAuthenticators } from './relay/relay-auth';
import type { TelemetryStore } from './relay/telemetry-store';

export interface AppDeps {
  db: Db;
  logger: Logger;
  mailer: Mailer;
  tokenSecret: string;
  /** Where links in mails point, e.g. http://127.0.0.1:5810 */
  publicUrl: string;
  cookies?: CookiePolicy;
  /** Present when the local fake SMTP server catches the mail: enables /api/dev/mails. */
  devInbox?: DevInbox;
  /** The built client (dist/client); served with a fallback to index.html when it exists. */
  clientDir?: string;
  signInLimit?: SignInLimit;
  now?: () => Date;
  /**
   * Where the relay stores robot telemetry before confirming it. By default the recorder, which writes each
   * match of a robot to PostgreSQL as a recording; a store given here replaces it (and no recorder runs).
   */
  telemetryStore?: TelemetryStore;
  /** Recorder timing (tests shorten the disconnect grace). */
  recorder?: Partial<Pick<RecorderOptions, 'graceMs' | 'tailMs' | 'autoGapMs' | 'preRollMs' | 'keepLiveSimulated'>>;
  /** Relay timing and limits (tests shorten them). */
  relay?: Partial<Pick<RelayDeps, 'heartbeatMs' | 'viewerHeartbeatMs' | 'staleMs' | 'viewerStaleMs' | 'maxFrameBytes' | 'limits' | 'helloTimeoutMs'>>;
}

export interface App {
  express: Express;
  /** Attach to the HTTP server's `upgrade` event. */
  relay: Relay;
  services: {
    auth: ReturnType<typeof createAuthService>;
    team: ReturnType<typeof createTeamService>;
    season: ReturnType<typeof createSeasonService>;
    recordings: ReturnType<typeof createRecordingsService>;
    recorder: ReturnType<typeof createRecorder>;
  };
}

/** Builds the HTTP application; listening and shutdown live in server/bin. */
export function createApp(deps: AppDeps): App {
  const now = deps.now ?? (() => new Date());
  const cookies = deps.cookies ?? { secure: false };
  const tokens = createSessionTokens(deps.tokenSecret, now);
  const common = { mailer: deps.mailer, publicUrl: deps.publicUrl, logger: deps.logger, now };
  const auth = createAuthService({ store: authStore(deps.db), ...common });
  let relay: Relay | undefined;
  const team = createTeamService({
    store: teamStore(deps.db),
    ...common,
    onRobotKeyRevoked: (keyId) => relay?.disconnectKey(keyId),
  });
  const recordings = createRecordingsService({ store: recordingsStore(deps.db), now, onFinished: storeCyclesOnFinish(deps.db, { now, logger: deps.logger }) });
  const recorder = createRecorder({ recordings, repo: recorderRepo(deps.db), logger: deps.logger, ...deps.recorder });
  relay = createRelay({
    ...relayAuthenticators({ tokens, auth, team }),
    store: deps.telemetryStore ?? recorder.store,
    observer: deps.telemetryStore ? undefined : recorder.observer,
    logger: deps.logger,
    ...deps.relay,
  });
  const season = createSeasonService({ profiles: robotProfileRepo(deps.db) });

  const app = express();
  app.disable('x-powered-by');
  app.set('trust proxy', 'loopback');

  const api = express.Router();
  api.use(markRequestStart);
  // Before the general parser: a panel document may hold 8 pages of 200 tiles (about 3.1 MB at most).
  api.use('/panels', express.json({ limit: PANEL_BODY_LIMIT }));
  api.use(express.json({ limit: '256kb' }));
  api.use(cookieParser());
  api.use(checkCsrf);
  api.use(loadSession(tokens, auth));
  api.use(healthRouter({ db: deps.db, devInbox: deps.devInbox }));
  api.use(authRouter({ auth, tokens, cookies, signInLimit: deps.signInLimit ?? DEFAULT_SIGN_IN_LIMIT }));
  api.use(teamRouter({ team, auth, tokens, cookies }));
  api.use(seasonRouter({ season, team }));
  api.use(recordingsRouter({ recordings }));
  api.use(notesRouter({ db: deps.db }));
  api.use(cyclesRouter({ db: deps.db, now }));
  api.use(panelsRouter({ db: deps.db, now }));
  api.use(drillsRouter({ db: deps.db, now }));
  api.use(recorderRouter({ recorder }));
  api.use(() => {
    throw new AppError('not_found', 'No such API route');
  });
  app.use('/api', api);

  if (deps.clientDir && existsSync(path.join(deps.clientDir, 'index.html'))) {
    const clientDir = deps.clientDir;
    app.use(express.static(clientDir, { index: false, maxAge: '1h' }));
    // Run mode's addresses get its own light page (client/run.html: no React Router); the rest the app's.
    if (existsSync(path.join(clientDir, 'run.html'))) {
      app.get(['/run', '/panels/:id/run'], (_req, res) => res.sendFile(path.join(clientDir, 'run.html')));
    }
    app.get('/{*splat}', (_req, res) => res.sendFile(path.join(clientDir, 'index.html')));
  }
  app.use(errorHandler(deps.logger));

  return { express: app, relay, services: { auth, team, season, recordings, recorder } };
}
