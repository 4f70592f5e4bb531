// One e-mail in the outbox: written in the same transaction as what caused it, then sent by the
// outbox worker with retries, so a message survives a mail server that is down or a restart.
import { DataTypes, Model } from 'sequelize';
import type {
  CreationOptional,
  ForeignKey,
  InferAttributes,
  InferCreationAttributes,
  NonAttribute,
  Sequelize,
} from 'sequelize';
import { outboxKinds, outboxStatuses } from '@heatpath/contracts';
import type { MailRecipient, OutboxKind, OutboxStatus } from '@heatpath/contracts';
import type { DiagnosticCase } from './diagnostic-case';
import type { OutboxAttachment } from './outbox-attachment';
import type { User } from './user';
import type { Workshop } from './workshop';

export class OutboxMessage extends Model<
  InferAttributes<OutboxMessage>,
  InferCreationAttributes<OutboxMessage>
> {
  declare id: CreationOptional<string>;
  declare workshopId: ForeignKey<Workshop['id']>;
  declare kind: OutboxKind;
  declare caseId: ForeignKey<DiagnosticCase['id']> | null;
  declare findingsRevision: number | null;
  declare recipients: MailRecipient[];
  declare subject: string;
  declare bodyText: string;
  /** An encrypted sign-in link the worker puts into the body; null once sent. */
  declare sealedLink: string | null;
  declare status: CreationOptional<OutboxStatus>;
  declare attempts: CreationOptional<number>;
  declare nextAttemptAt: CreationOptional<Date>;
  declare lastAttemptAt: CreationOptional<Date | null>;
  declare lastError: CreationOptional<string | null>;
  declare sentAt: CreationOptional<Date | null>;
  declare smtpMessageId: CreationOptional<string | null>;
  declare createdBy: ForeignKey<User['id']> | null;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;
  declare attachments?: NonAttribute<OutboxAttachment[]>;
  declare creator?: NonAttribute<User | null>;

  static initModel(sequelize: Sequelize): void {
    OutboxMessage.init(
      {
        id: { type: DataTypes.UUID, defaultValue: DataTypes.UUIDV4, primaryKey: true },
        kind: { type: DataTypes.STRING(30), allowNull: false, validate: { isIn: [outboxKinds] } },
        findingsRevision: { type: DataTypes.INTEGER, allowNull: true },
        recipients: { type: DataTypes.JSONB, allowNull: false },
        subject: { type: DataTypes.STRING(250), allowNull: false },
        bodyText: { type: DataTypes.TEXT, allowNull: false },
        sealedLink: { type: DataTypes.TEXT, allowNull: true },
        status: {
          type: DataTypes.ENUM(...outboxStatuses),
          allowNull: false,
          defaultValue: 'queued',
        },
        attempts: { type: DataTypes.INTEGER, allowNull: false, defaultValue: 0 },
        nextAttemptAt: { type: DataTypes.DATE, allowNull: false, defaultValue: DataTypes.NOW },
        lastAttemptAt: { type: DataTypes.DATE, allowNull: true },
        lastError: { type: DataTypes.TEXT, allowNull: true },
        sentAt: { type: DataTypes.DATE, allowNull: true },
        smtpMessageId: { type: DataTypes.STRING(250), allowNull: true },
        createdAt: DataTypes.DATE,
        updatedAt: DataTypes.DATE,
      },
      { sequelize, tableName: 'outbox_messages', modelName: 'OutboxMessage' },
    );
  }
}
