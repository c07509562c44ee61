import type { Sequelize } from 'sequelize'
import { Invitation } from './invitation'
import { MailSend } from './mail-send'
import { Membership } from './membership'
import { OutboxMessage } from './outbox-message'
import { PasswordReset } from './password-reset'
import { RefreshToken } from './refresh-token'
import { Scenario } from './scenario'
import { ScenarioVersion } from './scenario-version'
import { ShareLink } from './share-link'
import { Suite, SuiteRun } from './suite'
import { Sweep } from './sweep'
import { Upload } from './upload'
import { User } from './user'
import { UserSession } from './user-session'
import { Workspace } from './workspace'

export { Invitation, MailSend, Membership, OutboxMessage, PasswordReset, RefreshToken, Scenario, ScenarioVersion, ShareLink, Suite, SuiteRun, Sweep, Upload, User, UserSession, Workspace }

/** Binds every model to the connection and declares the associations. */
export function initModels(sequelize: Sequelize): void {
  for (const model of [User, Workspace, Membership, Invitation, PasswordReset, RefreshToken, OutboxMessage, Upload, Scenario, ScenarioVersion, ShareLink, UserSession, MailSend, Sweep, Suite, SuiteRun]) {
    model.initModel(sequelize)
  }
  Membership.belongsTo(User, { as: 'user', foreignKey: 'userId' })
  Membership.belongsTo(Workspace, { as: 'workspace', foreignKey: 'workspaceId' })
  Workspace.hasMany(Membership, { as: 'memberships', foreignKey: 'workspaceId' })
  User.hasMany(Membership, { as: 'memberships', foreignKey: 'userId' })
  Invitation.belongsTo(User, { as: 'invitedBy', foreignKey: 'invitedById' })
  Scenario.belongsTo(User, { as: 'author', foreignKey: 'authorId' })
  Scenario.belongsTo(Workspace, { as: 'workspace', foreignKey: 'workspaceId' })
  ShareLink.belongsTo(ScenarioVersion, { as: 'version', foreignKey: 'versionId' })
  ShareLink.belongsTo(Scenario, { as: 'scenario', foreignKey: 'scenarioId' })
  ShareLink.belongsTo(User, { as: 'createdBy', foreignKey: 'createdById' })
  Upload.belongsTo(User, { as: 'uploadedBy', foreignKey: 'uploadedById' })
  SuiteRun.belongsTo(User, { as: 'startedBy', foreignKey: 'startedById' })
}
