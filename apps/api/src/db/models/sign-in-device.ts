// A browser a person has signed in from (OWASP's device cookie): the browser keeps a signed
// random id, and this row says it has signed in as this person, so it keeps its own sign-in
// allowance when guesses from elsewhere pause the account. A new password forgets them all.
import { DataTypes, Model } from 'sequelize';
import type { ForeignKey, InferAttributes, InferCreationAttributes, Sequelize } from 'sequelize';
import type { User } from './user';
import type { Workshop } from './workshop';

export class SignInDevice extends Model<
  InferAttributes<SignInDevice>,
  InferCreationAttributes<SignInDevice>
> {
  declare deviceId: string;
  declare userId: User['id'];
  declare workshopId: ForeignKey<Workshop['id']>;
  declare createdAt: Date;
  declare lastSignInAt: Date;

  static initModel(sequelize: Sequelize): void {
    SignInDevice.init(
      {
        deviceId: { type: DataTypes.UUID, primaryKey: true },
        userId: { type: DataTypes.UUID, primaryKey: true },
        createdAt: { type: DataTypes.DATE, allowNull: false },
        lastSignInAt: { type: DataTypes.DATE, allowNull: false },
      },
      { sequelize, tableName: 'sign_in_devices', modelName: 'SignInDevice', timestamps: false },
    );
  }
}
