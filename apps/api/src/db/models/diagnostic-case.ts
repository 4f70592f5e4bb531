// A case: one vehicle's complaint walked through one pinned tree version.
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
import type { TreeVersion } from './tree-version';
import type { User } from './user';
import type { DistanceUnit, Vehicle } from './vehicle';
import type { Workshop } from './workshop';

export const caseStatuses = ['open', 'in_diagnosis', 'diagnosed', 'closed'] as const;
export type CaseStatus = (typeof caseStatuses)[number];

export class DiagnosticCase extends Model<
  InferAttributes<DiagnosticCase>,
  InferCreationAttributes<DiagnosticCase>
> {
  declare id: CreationOptional<string>;
  declare workshopId: ForeignKey<Workshop['id']>;
  declare number: number;
  declare vehicleId: ForeignKey<Vehicle['id']>;
  declare customerId: ForeignKey<Customer['id']> | null;
  declare complaint: string;
  declare mileageAtIntake: number | null;
  declare mileageUnit: CreationOptional<DistanceUnit>;
  declare symptom: string;
  declare treeVersionId: ForeignKey<TreeVersion['id']>;
  declare status: CreationOptional<CaseStatus>;
  declare assignedTo: ForeignKey<User['id']> | null;
  declare createdBy: ForeignKey<User['id']>;
  declare currentNodeId: string | null;
  declare currentStepTitle: string | null;
  declare outcomeNodeId: CreationOptional<string | null>;
  declare eventCount: CreationOptional<number>;
  declare searchText: CreationOptional<string>;
  declare diagnosedAt: CreationOptional<Date | null>;
  declare closedAt: CreationOptional<Date | null>;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;
  declare vehicle?: NonAttribute<Vehicle>;
  declare customer?: NonAttribute<Customer | null>;
  declare treeVersion?: NonAttribute<TreeVersion>;
  declare assignee?: NonAttribute<User | null>;

  static initModel(sequelize: Sequelize): void {
    DiagnosticCase.init(
      {
        id: { type: DataTypes.UUID, defaultValue: DataTypes.UUIDV4, primaryKey: true },
        number: { type: DataTypes.INTEGER, allowNull: false },
        complaint: { type: DataTypes.TEXT, allowNull: false },
        mileageAtIntake: { type: DataTypes.INTEGER, allowNull: true },
        mileageUnit: { type: DataTypes.ENUM('km', 'mi'), allowNull: false, defaultValue: 'km' },
        symptom: { type: DataTypes.STRING(300), allowNull: false },
        status: { type: DataTypes.ENUM(...caseStatuses), allowNull: false, defaultValue: 'open' },
        currentNodeId: { type: DataTypes.STRING(80), allowNull: true },
        currentStepTitle: { type: DataTypes.STRING(200), allowNull: true },
        outcomeNodeId: { type: DataTypes.STRING(80), allowNull: true },
        eventCount: { type: DataTypes.INTEGER, allowNull: false, defaultValue: 0 },
        searchText: { type: DataTypes.TEXT, allowNull: false, defaultValue: '' },
        diagnosedAt: { type: DataTypes.DATE, allowNull: true },
        closedAt: { type: DataTypes.DATE, allowNull: true },
        createdAt: DataTypes.DATE,
        updatedAt: DataTypes.DATE,
      },
      { sequelize, tableName: 'cases', modelName: 'DiagnosticCase' },
    );
  }
}
