// A single-use, expiring token behind an invitation, a password reset or a sign-in unlock. Only
// its SHA-256 is stored; the token itself exists in the e-mail alone.
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

export const accountTokenPurposes = ['invitation', 'password-reset', 'sign-in-unlock'] as const;
export type AccountTokenPurpose = (typeof accountTokenPurposes)[number];

export class AccountToken extends Model<
  InferAttributes<AccountToken>,
  InferCreationAttributes<AccountToken>
> {
  declare id: CreationOptional<string>;
  declare userId: ForeignKey<User['id']>;
  declare workshopId: ForeignKey<Workshop['id']>;
  declare purpose: AccountTokenPurpose;
  declare tokenHash: string;
  declare expiresAt: Date;
  /** Set when the token is used, or when a newer one replaces it. */
  declare usedAt: CreationOptional<Date | null>;
  declare createdBy: ForeignKey<User['id']> | null;
  declare createdAt: CreationOptional<Date>;
  declare user?: NonAttribute<User>;

  static initModel(sequelize: Sequelize): void {
    AccountToken.init(
      {
        id: { type: DataTypes.UUID, defaultValue: DataTypes.UUIDV4, primaryKey: true },
        purpose: { type: DataTypes.ENUM(...accountTokenPurposes), allowNull: false },
        tokenHash: { type: DataTypes.CHAR(64), allowNull: false, unique: true },
        expiresAt: { type: DataTypes.DATE, allowNull: false },
        usedAt: { type: DataTypes.DATE, allowNull: true },
        createdAt: DataTypes.DATE,
      },
      { sequelize, tableName: 'account_tokens', modelName: 'AccountToken', updatedAt: false },
    );
  }
}
