// A photo, file or log attached to a case or one of its steps. The bytes live in storage under
// a generated key; this row is written only after they are safely there.
import { DataTypes, Model } from 'sequelize';
import type {
  CreationOptional,
  ForeignKey,
  InferAttributes,
  InferCreationAttributes,
  Sequelize,
} from 'sequelize';
import type { DiagnosticCase } from './diagnostic-case';
import type { User } from './user';
import type { Workshop } from './workshop';

export type AttachmentKind = 'photo' | 'file' | 'log';

export class Attachment extends Model<
  InferAttributes<Attachment>,
  InferCreationAttributes<Attachment>
> {
  declare id: CreationOptional<string>;
  declare caseId: ForeignKey<DiagnosticCase['id']>;
  declare workshopId: ForeignKey<Workshop['id']>;
  declare nodeId: string | null;
  declare kind: AttachmentKind;
  declare storageKey: string;
  declare thumbnailKey: string | null;
  declare originalName: string;
  declare mediaType: string;
  declare byteSize: number;
  declare width: number | null;
  declare height: number | null;
  declare uploadedBy: ForeignKey<User['id']>;
  /** The sender's key for this upload (unique per case), when it came with one. */
  declare idempotencyKey: CreationOptional<string | null>;
  /** Hex SHA-256 of the content, kept for uploads with an idempotency key. */
  declare sha256: CreationOptional<string | null>;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;

  static initModel(sequelize: Sequelize): void {
    Attachment.init(
      {
        id: { type: DataTypes.UUID, defaultValue: DataTypes.UUIDV4, primaryKey: true },
        nodeId: { type: DataTypes.STRING(80), allowNull: true },
        kind: { type: DataTypes.ENUM('photo', 'file', 'log'), allowNull: false },
        storageKey: { type: DataTypes.STRING(200), allowNull: false },
        thumbnailKey: { type: DataTypes.STRING(200), allowNull: true },
        originalName: { type: DataTypes.STRING(255), allowNull: false },
        mediaType: { type: DataTypes.STRING(100), allowNull: false },
        byteSize: { type: DataTypes.INTEGER, allowNull: false },
        width: { type: DataTypes.INTEGER, allowNull: true },
        height: { type: DataTypes.INTEGER, allowNull: true },
        idempotencyKey: { type: DataTypes.STRING(100), allowNull: true, defaultValue: null },
        sha256: { type: DataTypes.CHAR(64), allowNull: true, defaultValue: null },
        createdAt: DataTypes.DATE,
        updatedAt: DataTypes.DATE,
      },
      { sequelize, tableName: 'attachments', modelName: 'Attachment' },
    );
  }
}
