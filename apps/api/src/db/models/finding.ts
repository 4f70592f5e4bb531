// The findings of a diagnosed case: concern, cause, correction, lines and readings, drafted from
// the reached outcome, edited by the technician and reviewed by the advisor. Every save is also
// kept as a FindingsRevision.
import { DataTypes, Model } from 'sequelize';
import type {
  CreationOptional,
  ForeignKey,
  InferAttributes,
  InferCreationAttributes,
  Sequelize,
} from 'sequelize';
import type { FindingsLines } from '@heatpath/contracts';
import type { DiagnosticCase } from './diagnostic-case';
import type { User } from './user';
import type { Workshop } from './workshop';

export class Finding extends Model<InferAttributes<Finding>, InferCreationAttributes<Finding>> {
  declare id: CreationOptional<string>;
  declare caseId: ForeignKey<DiagnosticCase['id']>;
  declare workshopId: ForeignKey<Workshop['id']>;
  declare outcomeNodeId: string;
  declare concern: string;
  declare cause: string;
  declare correction: string;
  declare parts: FindingsLines['parts'];
  declare labour: FindingsLines['labour'];
  declare followUps: FindingsLines['followUps'];
  declare readings: FindingsLines['readings'];
  /** Photos of the case chosen for the repair order, in the order they print. */
  declare photoIds: CreationOptional<string[]>;
  declare revision: CreationOptional<number>;
  declare updatedBy: ForeignKey<User['id']> | null;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;

  static initModel(sequelize: Sequelize): void {
    Finding.init(
      {
        id: { type: DataTypes.UUID, defaultValue: DataTypes.UUIDV4, primaryKey: true },
        outcomeNodeId: { type: DataTypes.STRING(80), allowNull: false },
        concern: { type: DataTypes.TEXT, allowNull: false },
        cause: { type: DataTypes.TEXT, allowNull: false },
        correction: { type: DataTypes.TEXT, allowNull: false },
        parts: { type: DataTypes.JSONB, allowNull: false, defaultValue: [] },
        labour: { type: DataTypes.JSONB, allowNull: false, defaultValue: [] },
        followUps: { type: DataTypes.JSONB, allowNull: false, defaultValue: [] },
        readings: { type: DataTypes.JSONB, allowNull: false, defaultValue: [] },
        photoIds: { type: DataTypes.JSONB, allowNull: false, defaultValue: [] },
        revision: { type: DataTypes.INTEGER, allowNull: false, defaultValue: 1 },
        createdAt: DataTypes.DATE,
        updatedAt: DataTypes.DATE,
      },
      { sequelize, tableName: 'findings', modelName: 'Finding' },
    );
  }
}
