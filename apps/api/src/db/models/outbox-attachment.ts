// A file sent with an outbox message (the repair-order PDF), kept with it so the message goes
// out exactly as it was written, however late.
import { DataTypes, Model } from 'sequelize';
import type {
  CreationOptional,
  ForeignKey,
  InferAttributes,
  InferCreationAttributes,
  Sequelize,
} from 'sequelize';
import type { OutboxMessage } from './outbox-message';
import type { Workshop } from './workshop';

export class OutboxAttachment extends Model<
  InferAttributes<OutboxAttachment>,
  InferCreationAttributes<OutboxAttachment>
> {
  declare id: CreationOptional<string>;
  declare messageId: ForeignKey<OutboxMessage['id']>;
  declare workshopId: ForeignKey<Workshop['id']>;
  declare filename: string;
  declare mediaType: string;
  declare byteSize: number;
  declare content: Buffer;
  declare createdAt: CreationOptional<Date>;

  static initModel(sequelize: Sequelize): void {
    OutboxAttachment.init(
      {
        id: { type: DataTypes.UUID, defaultValue: DataTypes.UUIDV4, primaryKey: true },
        filename: { type: DataTypes.STRING(200), allowNull: false },
        mediaType: { type: DataTypes.STRING(100), allowNull: false },
        byteSize: { type: DataTypes.INTEGER, allowNull: false },
        content: { type: DataTypes.BLOB, allowNull: false },
        createdAt: DataTypes.DATE,
      },
      {
        sequelize,
        tableName: 'outbox_attachments',
        modelName: 'OutboxAttachment',
        updatedAt: false,
      },
    );
  }
}
