import 'reflect-metadata';
import { DataSource } from 'typeorm';
import { AppUser, CapturedMail, Design, Invitation, MaterialFamily, MaterialFamilyVersion, PasswordReset, Run, SignUpRequest, Sweep, Team, WorkerHeartbeat, GrowthOrder, ModuleDesign, Cooler } from './entities';
import { Foundation1764612000000 } from './migrations/1764612000000-foundation';
import { FamilyVersions1764615600000 } from './migrations/1764615600000-family-versions';
import { Accounts1764619200000 } from './migrations/1764619200000-accounts';
import { DesignsAndRuns1764622800000 } from './migrations/1764622800000-designs-and-runs';
import { GrowthOrders1764626400000 } from './migrations/1764626400000-growth-orders';
import { ModuleDesigns1764630000000 } from './migrations/1764630000000-module-designs';
import { MoreStarts1764633600000 } from './migrations/1764633600000-more-starts';
import { RunQueue1764640800000 } from './migrations/1764640800000-run-queue';
import { MemberRemoval1764637200000 } from './migrations/1764637200000-member-removal';
import { AuditTrail1764644400000 } from './migrations/1764644400000-audit-trail';
import { SignUpRequests1764646200000 } from './migrations/1764646200000-sign-up-requests';
import { DesignContacts1764649000000 } from './migrations/1764649000000-design-contacts';
import { GrowthYield1764651600000 } from './migrations/1764651600000-growth-yield';
import { RunNumbers1764655200000 } from './migrations/1764655200000-run-numbers';
import { Coolers1764658800000 } from './migrations/1764658800000-coolers';
import { SnakeNamingStrategy } from './naming';
import { quietPoolErrors } from './pool-errors';

/** Migrations in order; a new one is appended here as well as written. */
export const migrations = [Foundation1764612000000, FamilyVersions1764615600000, Accounts1764619200000, DesignsAndRuns1764622800000, GrowthOrders1764626400000, ModuleDesigns1764630000000, MoreStarts1764633600000, MemberRemoval1764637200000, RunQueue1764640800000, AuditTrail1764644400000, SignUpRequests1764646200000, DesignContacts1764649000000, GrowthYield1764651600000, RunNumbers1764655200000, Coolers1764658800000];

export function createDataSource(databaseUrl: string, applicationName = 'frostgrade'): DataSource {
  return new DataSource({
    type: 'postgres',
    url: databaseUrl,
    applicationName,
    entities: [Team, MaterialFamily, MaterialFamilyVersion, CapturedMail, WorkerHeartbeat, AppUser, Invitation, PasswordReset, Design, Run, Sweep, GrowthOrder, ModuleDesign, SignUpRequest, Cooler],
    migrations,
    migrationsTableName: 'schema_migration',
    namingStrategy: new SnakeNamingStrategy(),
    synchronize: false,
    logging: ['error'],
    // A request must not hang while PostgreSQL is away: connecting gives up
    // after 5 s and the request answers 503 (server/http/errors.ts).
    connectTimeoutMS: 5000,
    // Idle connections dropped by a restart are reported here, not thrown.
    poolErrorHandler: quietPoolErrors(applicationName),
    extra: { max: 10 },
  });
}
