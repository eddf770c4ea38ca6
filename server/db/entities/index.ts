// Every entity class, listed once for the data source (no globs: tsx and vitest resolve no patterns).
import { AuditEntryEntity } from './audit-entry.entity';
import { InvitationEntity } from './invitation.entity';
import { MembershipEntity } from './membership.entity';
import { OneTimeTokenEntity } from './one-time-token.entity';
import { OrganisationEntity } from './organisation.entity';
import { PriceListEntity } from './price-list.entity';
import { ProjectEntity } from './project.entity';
import { RunEntity } from './run.entity';
import { ScenarioRevisionEntity } from './scenario-revision.entity';
import { ScenarioEntity } from './scenario.entity';
import { SessionEntity } from './session.entity';
import { SignInAttemptEntity } from './sign-in-attempt.entity';
import { ShareLinkEntity } from './share-link.entity';
import { ComparisonEntity } from './comparison.entity';
import { StudyJobFailureEntity } from './study-job-failure.entity';
import { StudyJobResultEntity } from './study-job-result.entity';
import { StudyPointEntity } from './study-point.entity';
import { StudyEntity } from './study.entity';
import { TimeStudyEntity } from './time-study.entity';
import { UserEntity } from './user.entity';

export {
  AuditEntryEntity,
  InvitationEntity,
  MembershipEntity,
  OneTimeTokenEntity,
  OrganisationEntity,
  PriceListEntity,
  ProjectEntity,
  RunEntity,
  ScenarioRevisionEntity,
  ScenarioEntity,
  SessionEntity,
  SignInAttemptEntity,
  ShareLinkEntity,
  ComparisonEntity,
  StudyEntity,
  StudyJobFailureEntity,
  StudyJobResultEntity,
  StudyPointEntity,
  TimeStudyEntity,
  UserEntity,
};

export const entities = [
  UserEntity,
  OrganisationEntity,
  MembershipEntity,
  SessionEntity,
  ProjectEntity,
  ScenarioEntity,
  ScenarioRevisionEntity,
  RunEntity,
  TimeStudyEntity,
  PriceListEntity,
  StudyEntity,
  StudyPointEntity,
  StudyJobResultEntity,
  StudyJobFailureEntity,
  AuditEntryEntity,
  SignInAttemptEntity,
  InvitationEntity,
  OneTimeTokenEntity,
  ShareLinkEntity,
  ComparisonEntity,
];
