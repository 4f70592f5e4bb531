// One signed-in browser's session. The cookie names it; it counts only while not ended and not
// expired, so ending it here ends it for every API process. Deactivating a person or changing
// their password ends all of theirs (a trigger, migration 0007).
import { DataTypes, Model } from 'sequelize';
import type {
  CreationOptional,
  ForeignKey,
  InferAttributes,
  InferCreationAttributes,
  NonAttribute,
  Sequelize,
} from 'sequelize';
import type { User } from './user';
import type { Workshop } from './workshop';

export const sessionEndReasons = ['signed-out', 'deactivated', 'password-changed'] as const;
export type SessionEndReason = (typeof sessionEndReasons)[number];

export class Session extends Model<InferAttributes<Session>, InferCreationAttributes<Session>> {
  declare id: CreationOptional<string>;
  declare userId: ForeignKey<User['id']>;
  declare workshopId: ForeignKey<Workshop['id']>;
  declare createdAt: Date;
  declare expiresAt: Date;
  declare endedAt: CreationOptional<Date | null>;
  declare endedReason: CreationOptional<SessionEndReason | null>;
  declare user?: NonAttribute<User>;

  static initModel(sequelize: Sequelize): void {
    Session.init(
      {
        id: { type: DataTypes.UUID, defaultValue: DataTypes.UUIDV4, primaryKey: true },
        createdAt: { type: DataTypes.DATE, allowNull: false },
        expiresAt: { type: DataTypes.DATE, allowNull: false },
        endedAt: { type: DataTypes.DATE, allowNull: true },
        endedReason: { type: DataTypes.STRING(30), allowNull: true },
      },
      // Times come from the app's clock, so Sequelize's own timestamps are off.
      { sequelize, tableName: 'sessions', modelName: 'Session', timestamps: false },
    );
  }
}
