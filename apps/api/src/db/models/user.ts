// A person who signs in. Belongs to exactly one workshop; deactivated people keep their history.
import { DataTypes, Model } from 'sequelize';
import type {
  CreationOptional,
  ForeignKey,
  InferAttributes,
  InferCreationAttributes,
  NonAttribute,
  Sequelize,
} from 'sequelize';
import { defaultUnitPreferences, roles } from '@heatpath/contracts';
import type { Role, UnitPreferences } from '@heatpath/contracts';
import type { Workshop } from './workshop';

export interface UserPreferences {
  units: UnitPreferences;
}

export class User extends Model<InferAttributes<User>, InferCreationAttributes<User>> {
  declare id: CreationOptional<string>;
  declare workshopId: ForeignKey<Workshop['id']>;
  declare email: string;
  declare name: string;
  declare role: Role;
  // Null until an invited person sets a password.
  declare passwordHash: string | null;
  declare active: CreationOptional<boolean>;
  declare preferences: CreationOptional<UserPreferences>;
  declare lastSignInAt: CreationOptional<Date | null>;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;
  declare workshop?: NonAttribute<Workshop>;

  static initModel(sequelize: Sequelize): void {
    User.init(
      {
        id: { type: DataTypes.UUID, defaultValue: DataTypes.UUIDV4, primaryKey: true },
        email: { type: DataTypes.STRING(254), allowNull: false, unique: true },
        name: { type: DataTypes.STRING(120), allowNull: false },
        role: { type: DataTypes.ENUM(...roles), allowNull: false },
        passwordHash: { type: DataTypes.STRING(100), allowNull: true },
        active: { type: DataTypes.BOOLEAN, allowNull: false, defaultValue: true },
        preferences: {
          type: DataTypes.JSONB,
          allowNull: false,
          defaultValue: { units: defaultUnitPreferences },
        },
        lastSignInAt: { type: DataTypes.DATE, allowNull: true },
        createdAt: DataTypes.DATE,
        updatedAt: DataTypes.DATE,
      },
      { sequelize, tableName: 'users', modelName: 'User' },
    );
  }
}
