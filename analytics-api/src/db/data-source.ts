import 'reflect-metadata';
import { DataSource } from 'typeorm';
import { Animal } from './entities/animal.entity';
import { AnimalStatusChange } from './entities/animal-status-change.entity';
import { Breed } from './entities/breed.entity';
import { Club } from './entities/club.entity';
import { ClubMembership } from './entities/club-membership.entity';
import { Evaluation } from './entities/evaluation.entity';
import { ImportJob } from './entities/import-job.entity';
import { Invitation } from './entities/invitation.entity';
import { Litter } from './entities/litter.entity';
import { MentorNote } from './entities/mentor-note.entity';
import { PasswordReset } from './entities/password-reset.entity';
import { Rabbitry } from './entities/rabbitry.entity';
import { RabbitryMembership } from './entities/rabbitry-membership.entity';
import { SavedMapping } from './entities/saved-mapping.entity';
import { SessionRow } from './entities/session.entity';
import { Show } from './entities/show.entity';
import { ShowResult } from './entities/show-result.entity';
import { User } from './entities/user.entity';
import { WeightRecord } from './entities/weight-record.entity';
import { migrations } from './migrations';

export const entities = [
  Animal, AnimalStatusChange, Breed, Club, ClubMembership, Evaluation, ImportJob, Invitation,
  Litter, MentorNote, PasswordReset, Rabbitry, RabbitryMembership, SavedMapping, SessionRow,
  Show, ShowResult, User, WeightRecord,
];

/** The schema comes from migrations only (no synchronize): the same path in dev, test and production. */
export function createDataSource(databaseUrl: string): DataSource {
  return new DataSource({
    type: 'mariadb',
    url: databaseUrl,
    entities,
    migrations,
    synchronize: false,
    migrationsRun: false,
    charset: 'utf8mb4_unicode_ci',
    timezone: 'Z',
    dateStrings: ['DATE'],
    extra: { connectionLimit: 20 },
    logging: ['error'],
  });
}
