// A vehicle the workshop has seen, found again by VIN or plate before a duplicate is made.
import { DataTypes, Model } from 'sequelize';
import type {
  CreationOptional,
  ForeignKey,
  InferAttributes,
  InferCreationAttributes,
  NonAttribute,
  Sequelize,
} from 'sequelize';
import type { Customer } from './customer';
import type { Workshop } from './workshop';

export const fuelKinds = ['petrol', 'diesel', 'hybrid', 'plug-in-hybrid', 'lpg', 'other'] as const;
export type FuelKind = (typeof fuelKinds)[number];
export type DistanceUnit = 'km' | 'mi';

export class Vehicle extends Model<InferAttributes<Vehicle>, InferCreationAttributes<Vehicle>> {
  declare id: CreationOptional<string>;
  declare workshopId: ForeignKey<Workshop['id']>;
  declare customerId: ForeignKey<Customer['id']> | null;
  declare vin: string | null;
  declare plate: string | null;
  declare plateKey: string | null;
  declare make: string;
  declare model: string;
  declare year: number | null;
  declare engine: string | null;
  declare fuel: FuelKind | null;
  declare mileage: number | null;
  declare mileageUnit: CreationOptional<DistanceUnit>;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;
  declare customer?: NonAttribute<Customer | null>;

  static initModel(sequelize: Sequelize): void {
    Vehicle.init(
      {
        id: { type: DataTypes.UUID, defaultValue: DataTypes.UUIDV4, primaryKey: true },
        vin: { type: DataTypes.CHAR(17), allowNull: true },
        plate: { type: DataTypes.STRING(16), allowNull: true },
        plateKey: { type: DataTypes.STRING(16), allowNull: true },
        make: { type: DataTypes.STRING(60), allowNull: false },
        model: { type: DataTypes.STRING(60), allowNull: false },
        year: { type: DataTypes.SMALLINT, allowNull: true },
        engine: { type: DataTypes.STRING(80), allowNull: true },
        fuel: { type: DataTypes.ENUM(...fuelKinds), allowNull: true },
        mileage: { type: DataTypes.INTEGER, allowNull: true },
        mileageUnit: { type: DataTypes.ENUM('km', 'mi'), allowNull: false, defaultValue: 'km' },
        createdAt: DataTypes.DATE,
        updatedAt: DataTypes.DATE,
      },
      { sequelize, tableName: 'vehicles', modelName: 'Vehicle' },
    );
  }
}
