import type { Sequelize } from 'sequelize';
import { AccessionCounter } from './AccessionCounter';
import { Asset } from './Asset';
import { Alert } from './Alert';
import { AuditEvent } from './AuditEvent';
import { Invitation } from './Invitation';
import { ConditionReport } from './ConditionReport';
import { ImportJob } from './ImportJob';
import { ImportMapping } from './ImportMapping';
import { FixityCheck } from './FixityCheck';
import { ToneReevaluation } from './ToneReevaluation';
import { Checklist } from './Checklist';
import { Location } from './Location';
import { Negative } from './Negative';
import { OutboxMessage } from './OutboxMessage';
import { Paper } from './Paper';
import { PasswordReset } from './PasswordReset';
import { Print } from './Print';
import { ProcessingStep } from './ProcessingStep';
import { Setting } from './Setting';
import { QueuedMail } from './QueuedMail';
import { SavedSearch } from './SavedSearch';
import { SolutionBatch } from './SolutionBatch';
import { Source } from './Source';
import { Treatment } from './Treatment';
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
    ConditionReport,
    Treatment,
    ImportJob,
    ImportMapping,
    Asset,
    FixityCheck,
    ToneReevaluation,
    SavedSearch,
    Checklist,
    Source,
  ]) {
    model.initModel(sequelize);
  }
  Print.belongsTo(Paper, { as: 'paper', foreignKey: 'paperId' });
  Print.belongsTo(Negative, { as: 'negative', foreignKey: 'negativeId' });
  Print.belongsTo(Location, { as: 'location', foreignKey: 'locationId' });
  Print.belongsTo(User, { as: 'creator', foreignKey: 'createdBy' });
  Print.belongsTo(Source, { as: 'source', foreignKey: 'sourceId' });
  Print.hasMany(ProcessingStep, { as: 'processing', foreignKey: 'printId' });
  ProcessingStep.belongsTo(Print, { foreignKey: 'printId' });
  ProcessingStep.belongsTo(SolutionBatch, { as: 'solutionBatch', foreignKey: 'solutionBatchId' });
  Location.belongsTo(Location, { as: 'parent', foreignKey: 'parentId' });
  AuditEvent.belongsTo(User, { as: 'user', foreignKey: 'userId' });
  ToneCheck.belongsTo(User, { as: 'checker', foreignKey: 'checkedBy' });
  Alert.belongsTo(Print, { as: 'print', foreignKey: 'printId' });
  Alert.belongsTo(User, { as: 'acknowledger', foreignKey: 'acknowledgedBy' });
  PasswordReset.belongsTo(User, { as: 'user', foreignKey: 'userId' });
  ConditionReport.belongsTo(User, { as: 'reporter', foreignKey: 'reportedBy' });
  Treatment.belongsTo(User, { as: 'treater', foreignKey: 'treatedBy' });
  Print.hasMany(Asset, { as: 'assets', foreignKey: 'printId' });
  Asset.belongsTo(Print, { as: 'print', foreignKey: 'printId' });
  SavedSearch.belongsTo(User, { as: 'user', foreignKey: 'userId' });
  Checklist.belongsTo(User, { as: 'creator', foreignKey: 'createdBy' });
}

export {
  AccessionCounter,
  Asset,
  FixityCheck,
  ToneReevaluation,
  Alert,
  AuditEvent,
  Invitation,
  Checklist,
  ConditionReport,
  ImportJob,
  ImportMapping,
  Location,
  Negative,
  OutboxMessage,
  Paper,
  PasswordReset,
  Print,
  ProcessingStep,
  Setting,
  QueuedMail,
  SavedSearch,
  SolutionBatch,
  Source,
  Treatment,
  ToneCheck,
  User,
};
