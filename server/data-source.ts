import 'reflect-metadata';
import { DataSource } from 'typeorm';
import { UserEntity } from './modules/users/user.entity.ts';
import { PasswordResetTokenEntity } from './modules/auth/password-reset-token.entity.ts';
import { Foundation1764633600000 } from './migrations/1764633600000-Foundation.ts';
import { PrintJobs1764720000000 } from './migrations/1764720000000-PrintJobs.ts';
import { PrintJobEntity } from './modules/prints/print-job.entity.ts';
import { Workspace1764806400000 } from './migrations/1764806400000-Workspace.ts';
import { PatternEntity } from './modules/patterns/pattern.entity.ts';
import { ProfileEntity } from './modules/profiles/profile.entity.ts';
import { ProfileMeasurementSetEntity } from './modules/profiles/profile-measurement-set.entity.ts';
import { MakeEntity } from './modules/makes/make.entity.ts';
import { MakeRevisionEntity } from './modules/makes/make-revision.entity.ts';
import { Fabrics1764892800000 } from './migrations/1764892800000-Fabrics.ts';
import { FitPlanner1764979200000 } from './migrations/1764979200000-FitPlanner.ts';
import { PrintMakes1765065600000 } from './migrations/1765065600000-PrintMakes.ts';
import { FabricEntity } from './modules/fabrics/fabric.entity.ts';

export const entities = [UserEntity, PasswordResetTokenEntity, PrintJobEntity, PatternEntity, ProfileEntity, ProfileMeasurementSetEntity, MakeEntity, MakeRevisionEntity, FabricEntity];
export const migrations = [Foundation1764633600000, PrintJobs1764720000000, Workspace1764806400000, Fabrics1764892800000, FitPlanner1764979200000, PrintMakes1765065600000];

/** The app's DataSource. Schema changes go through migrations only (`synchronize` is off). */
export function createDataSource(url: string): DataSource {
  return new DataSource({
    type: 'postgres',
    url,
    entities,
    migrations,
    synchronize: false,
    migrationsRun: false,
    logging: ['error'],
    extra: { max: 10 },
  });
}

/** For the TypeORM command line (`npm run migration:run`), which needs DATABASE_URL. */
export default createDataSource(process.env.DATABASE_URL ?? 'postgres://localhost/blockwright');
