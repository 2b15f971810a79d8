import type { Sequelize } from 'sequelize';
import { PasswordReset } from '../features/auth/password-reset.model';
import { Session } from '../features/auth/session.model';
import { User } from '../features/auth/user.model';
import { initAuditModel } from '../features/audit/audit-event.model';
import { initBenchLogModels } from '../features/bench-log/log-entry.model';
import { Calculation } from '../features/calculations/calculation.model';
import { initClassModels } from '../features/classes/class.model';
import { initInvitationModel } from '../features/classes/invitation.model';
import { initCourseModels } from '../features/courses/course.model';
import { Notification } from '../features/notifications/notification.model';
import { OutboxMessage } from '../features/outbox/outbox-message.model';
import { IdempotencyKey } from '../features/idempotency/idempotency-key.model';
import { initReviewModels } from '../features/reviews/review.model';
import { initSubmissionModels } from '../features/submissions/submission.model';
import { Upload } from '../features/uploads/upload.model';
import { initLessonProgressModel } from '../features/courses/lesson-progress.model';
import { initRecordModels } from '../features/record/record.model';

/** Every model is initialised here, once per Sequelize instance; each feature registers its own in one line. */
export function initModels(sequelize: Sequelize) {
  User.initModel(sequelize);
  Session.initModel(sequelize);
  PasswordReset.initModel(sequelize);
  initCourseModels(sequelize);
  initLessonProgressModel(sequelize);
  initClassModels(sequelize);
  Upload.initModel(sequelize);
  initSubmissionModels(sequelize);
  initReviewModels(sequelize);
  Notification.initModel(sequelize);
  Calculation.initModel(sequelize);
  initInvitationModel(sequelize);
  initAuditModel(sequelize);
  initBenchLogModels(sequelize);
  OutboxMessage.initModel(sequelize);
  IdempotencyKey.initModel(sequelize);
  initRecordModels(sequelize);
}
