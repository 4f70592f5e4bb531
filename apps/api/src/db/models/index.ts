// Attaches every model to a Sequelize instance and declares their associations.
import type { Sequelize } from 'sequelize';
import { AccountToken } from './account-token';
import { Attachment } from './attachment';
import { CaseEvent } from './case-event';
import { Customer } from './customer';
import { DiagnosticCase } from './diagnostic-case';
import { Finding } from './finding';
import { FindingsRevision } from './findings-revision';
import { OutboxAttachment } from './outbox-attachment';
import { OutboxMessage } from './outbox-message';
import { RegressionCase } from './regression-case';
import { Session } from './session';
import { SignInDevice } from './sign-in-device';
import { TemperatureLog } from './temperature-log';
import { TemperatureLogMapping } from './temperature-log-mapping';
import { TemperatureLogUpload } from './temperature-log-upload';
import { TrainingAttempt } from './training-attempt';
import { TrainingCase } from './training-case';
import { TrainingCourse } from './training-course';
import { TrainingCourseItem } from './training-course-item';
import { TrainingPrediction } from './training-prediction';
import { TrainingSignOff } from './training-sign-off';
import { Tree } from './tree';
import { TreeVersion } from './tree-version';
import { User } from './user';
import { Vehicle } from './vehicle';
import { Workshop } from './workshop';

export {
  AccountToken,
  Attachment,
  CaseEvent,
  Customer,
  DiagnosticCase,
  Finding,
  FindingsRevision,
  OutboxAttachment,
  OutboxMessage,
  RegressionCase,
  Session,
  SignInDevice,
  TemperatureLog,
  TemperatureLogMapping,
  TemperatureLogUpload,
  TrainingAttempt,
  TrainingCase,
  TrainingCourse,
  TrainingCourseItem,
  TrainingPrediction,
  TrainingSignOff,
  Tree,
  TreeVersion,
  User,
  Vehicle,
  Workshop,
};

export function initModels(sequelize: Sequelize): void {
  for (const model of [
    Workshop,
    User,
    Customer,
    Vehicle,
    Tree,
    TreeVersion,
    DiagnosticCase,
    CaseEvent,
    Attachment,
    Finding,
    RegressionCase,
    FindingsRevision,
    OutboxMessage,
    OutboxAttachment,
    AccountToken,
    Session,
    SignInDevice,
    TemperatureLogMapping,
    TemperatureLogUpload,
    TemperatureLog,
    TrainingAttempt,
    TrainingCase,
    TrainingCourse,
    TrainingCourseItem,
    TrainingPrediction,
    TrainingSignOff,
  ]) {
    model.initModel(sequelize);
  }
  const fk = (name: string) => ({ foreignKey: { name, allowNull: false } });
  Workshop.hasMany(User, { foreignKey: 'workshopId', as: 'users' });
  User.belongsTo(Workshop, { foreignKey: 'workshopId', as: 'workshop' });
  Customer.belongsTo(Workshop, fk('workshopId'));
  Vehicle.belongsTo(Workshop, fk('workshopId'));
  Vehicle.belongsTo(Customer, { foreignKey: 'customerId', as: 'customer' });
  Tree.belongsTo(Workshop, fk('workshopId'));
  Tree.hasMany(TreeVersion, { foreignKey: 'treeId', as: 'versions' });
  TreeVersion.belongsTo(Tree, { foreignKey: 'treeId', as: 'tree' });
  TreeVersion.belongsTo(Workshop, fk('workshopId'));
  TreeVersion.belongsTo(User, { foreignKey: 'createdBy', as: 'creator' });
  TreeVersion.belongsTo(User, { foreignKey: 'publishedBy', as: 'publisher' });
  DiagnosticCase.belongsTo(Workshop, fk('workshopId'));
  DiagnosticCase.belongsTo(Vehicle, { foreignKey: 'vehicleId', as: 'vehicle' });
  DiagnosticCase.belongsTo(Customer, { foreignKey: 'customerId', as: 'customer' });
  DiagnosticCase.belongsTo(TreeVersion, { foreignKey: 'treeVersionId', as: 'treeVersion' });
  DiagnosticCase.belongsTo(User, { foreignKey: 'assignedTo', as: 'assignee' });
  DiagnosticCase.belongsTo(User, { foreignKey: 'createdBy', as: 'creator' });
  CaseEvent.belongsTo(DiagnosticCase, { foreignKey: 'caseId', as: 'case' });
  CaseEvent.belongsTo(Workshop, fk('workshopId'));
  CaseEvent.belongsTo(User, { foreignKey: 'actorId', as: 'actor' });
  Attachment.belongsTo(DiagnosticCase, { foreignKey: 'caseId', as: 'case' });
  Attachment.belongsTo(Workshop, fk('workshopId'));
  Attachment.belongsTo(User, { foreignKey: 'uploadedBy', as: 'uploader' });
  Finding.belongsTo(DiagnosticCase, { foreignKey: 'caseId', as: 'case' });
  Finding.belongsTo(Workshop, fk('workshopId'));
  Finding.belongsTo(User, { foreignKey: 'updatedBy', as: 'editor' });
  RegressionCase.belongsTo(Tree, { foreignKey: 'treeId', as: 'tree' });
  RegressionCase.belongsTo(DiagnosticCase, { foreignKey: 'caseId', as: 'case' });
  RegressionCase.belongsTo(Workshop, fk('workshopId'));
  RegressionCase.belongsTo(User, { foreignKey: 'addedBy', as: 'adder' });
  Finding.hasMany(FindingsRevision, { foreignKey: 'findingId', as: 'revisions' });
  FindingsRevision.belongsTo(Finding, { foreignKey: 'findingId', as: 'finding' });
  FindingsRevision.belongsTo(DiagnosticCase, { foreignKey: 'caseId', as: 'case' });
  FindingsRevision.belongsTo(Workshop, fk('workshopId'));
  FindingsRevision.belongsTo(User, { foreignKey: 'savedBy', as: 'saver' });
  FindingsRevision.belongsTo(User, { foreignKey: 'approvedBy', as: 'approver' });
  OutboxMessage.belongsTo(Workshop, fk('workshopId'));
  OutboxMessage.belongsTo(DiagnosticCase, { foreignKey: 'caseId', as: 'case' });
  OutboxMessage.belongsTo(User, { foreignKey: 'createdBy', as: 'creator' });
  OutboxMessage.hasMany(OutboxAttachment, { foreignKey: 'messageId', as: 'attachments' });
  OutboxAttachment.belongsTo(OutboxMessage, { foreignKey: 'messageId', as: 'message' });
  OutboxAttachment.belongsTo(Workshop, fk('workshopId'));
  AccountToken.belongsTo(User, { foreignKey: 'userId', as: 'user' });
  AccountToken.belongsTo(Workshop, fk('workshopId'));
  AccountToken.belongsTo(User, { foreignKey: 'createdBy', as: 'creator' });
  Session.belongsTo(User, { foreignKey: 'userId', as: 'user' });
  Session.belongsTo(Workshop, fk('workshopId'));
  SignInDevice.belongsTo(Workshop, fk('workshopId'));
  TemperatureLogMapping.belongsTo(Workshop, fk('workshopId'));
  TemperatureLogMapping.belongsTo(User, { foreignKey: 'confirmedBy', as: 'confirmer' });
  TemperatureLogUpload.belongsTo(DiagnosticCase, { foreignKey: 'caseId', as: 'case' });
  TemperatureLogUpload.belongsTo(Workshop, fk('workshopId'));
  TemperatureLogUpload.belongsTo(User, { foreignKey: 'uploadedBy', as: 'uploader' });
  TemperatureLog.belongsTo(DiagnosticCase, { foreignKey: 'caseId', as: 'case' });
  TemperatureLog.belongsTo(Workshop, fk('workshopId'));
  TemperatureLog.belongsTo(Attachment, { foreignKey: 'attachmentId', as: 'attachment' });
  TemperatureLog.belongsTo(User, { foreignKey: 'uploadedBy', as: 'uploader' });
  TrainingCase.belongsTo(Workshop, fk('workshopId'));
  TrainingCase.belongsTo(DiagnosticCase, { foreignKey: 'caseId', as: 'case' });
  TrainingCase.belongsTo(User, { foreignKey: 'markedBy', as: 'marker' });
  TrainingCourse.belongsTo(Workshop, fk('workshopId'));
  TrainingCourse.belongsTo(User, { foreignKey: 'apprenticeId', as: 'apprentice' });
  TrainingCourse.belongsTo(User, { foreignKey: 'createdBy', as: 'creator' });
  TrainingCourse.hasMany(TrainingCourseItem, { foreignKey: 'courseId', as: 'items' });
  TrainingCourseItem.belongsTo(TrainingCourse, { foreignKey: 'courseId', as: 'course' });
  TrainingCourseItem.belongsTo(TrainingCase, { foreignKey: 'trainingCaseId', as: 'trainingCase' });
  TrainingAttempt.belongsTo(Workshop, fk('workshopId'));
  TrainingAttempt.belongsTo(TrainingCase, { foreignKey: 'trainingCaseId', as: 'trainingCase' });
  TrainingAttempt.belongsTo(User, { foreignKey: 'apprenticeId', as: 'apprentice' });
  TrainingAttempt.hasMany(TrainingPrediction, { foreignKey: 'attemptId', as: 'predictions' });
  TrainingPrediction.belongsTo(TrainingAttempt, { foreignKey: 'attemptId', as: 'attempt' });
  TrainingPrediction.belongsTo(Workshop, fk('workshopId'));
  TrainingSignOff.belongsTo(TrainingCourse, { foreignKey: 'courseId', as: 'course' });
  TrainingSignOff.belongsTo(User, { foreignKey: 'apprenticeId', as: 'apprentice' });
  TrainingSignOff.belongsTo(User, { foreignKey: 'signedBy', as: 'signer' });
  TrainingSignOff.belongsTo(Workshop, fk('workshopId'));
}
