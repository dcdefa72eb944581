import type { Sequelize } from 'sequelize';
import { AccessionCounter } from './AccessionCounter';
import { Alert } from './Alert';
import { AuditEvent } from './AuditEvent';
import { Invitation } from './Invitation';
import { Location } from './Location';
import { Negative } from './Negative';
import { OutboxMessage } from './OutboxMessage';
import { Paper } from './Paper';
import { PasswordReset } from './PasswordReset';
import { Print } from './Print';
import { ProcessingStep } from './ProcessingStep';
import { Setting } from './Setting';
import { QueuedMail } from './QueuedMail';
import { SolutionBatch } from './SolutionBatch';
import { ToneCheck } from './ToneCheck';
import { User } from './User';

/** Binds every model to the connection and declares how they relate. */
export function initModels(sequelize: Sequelize): void {
  for (const model of [
    User,
    Paper,
    Negative,
    Location,
    SolutionBatch,
    AccessionCounter,
    Print,
    ProcessingStep,
    AuditEvent,
    ToneCheck,
    Alert,
    Setting,
    QueuedMail,
    OutboxMessage,
    Invitation,
    PasswordReset,
  ]) {
    model.initModel(sequelize);
  }
  Print.belongsTo(Paper, { as: 'paper', foreignKey: 'paperId' });
  Print.belongsTo(Negative, { as: 'negative', foreignKey: 'negativeId' });
  Print.belongsTo(Location, { as: 'location', foreignKey: 'locationId' });
  Print.belongsTo(User, { as: 'creator', foreignKey: 'createdBy' });
  Print.hasMany(ProcessingStep, { as: 'processing', foreignKey: 'printId' });
  ProcessingStep.belongsTo(Print, { foreignKey: 'printId' });
  ProcessingStep.belongsTo(SolutionBatch, { as: 'solutionBatch', foreignKey: 'solutionBatchId' });
  Location.belongsTo(Location, { as: 'parent', foreignKey: 'parentId' });
  AuditEvent.belongsTo(User, { as: 'user', foreignKey: 'userId' });
  ToneCheck.belongsTo(User, { as: 'checker', foreignKey: 'checkedBy' });
  Alert.belongsTo(Print, { as: 'print', foreignKey: 'printId' });
  Alert.belongsTo(User, { as: 'acknowledger', foreignKey: 'acknowledgedBy' });
  PasswordReset.belongsTo(User, { as: 'user', foreignKey: 'userId' });
}

export {
  AccessionCounter,
  Alert,
  AuditEvent,
  Invitation,
  Location,
  Negative,
  OutboxMessage,
  Paper,
  PasswordReset,
  Print,
  ProcessingStep,
  Setting,
  QueuedMail,
  SolutionBatch,
  ToneCheck,
  User,
};
