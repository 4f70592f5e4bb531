// One saved revision of a case's findings: a snapshot of its content with who saved it and when,
// and, once approved, who approved it. The database refuses any change to the content, and any
// change at all once approved (see migration 0004's trigger).
import { DataTypes, Model } from 'sequelize';
import type {
  CreationOptional,
  ForeignKey,
  InferAttributes,
  InferCreationAttributes,
  NonAttribute,
  Sequelize,
} from 'sequelize';
import type { FindingsLines } from '@heatpath/contracts';
import type { DiagnosticCase } from './diagnostic-case';
import type { Finding } from './finding';
import type { User } from './user';
import type { Workshop } from './workshop';

export class FindingsRevision extends Model<
  InferAttributes<FindingsRevision>,
  InferCreationAttributes<FindingsRevision>
> {
  declare id: CreationOptional<string>;
  declare findingId: ForeignKey<Finding['id']>;
  declare caseId: ForeignKey<DiagnosticCase['id']>;
  declare workshopId: ForeignKey<Workshop['id']>;
  declare revision: number;
  declare outcomeNodeId: string;
  declare concern: string;
  declare cause: string;
  declare correction: string;
  declare parts: FindingsLines['parts'];
  declare labour: FindingsLines['labour'];
  declare followUps: FindingsLines['followUps'];
  declare readings: FindingsLines['readings'];
  declare photoIds: string[];
  declare savedBy: ForeignKey<User['id']> | null;
  declare approvedBy: ForeignKey<User['id']> | null;
  declare approvedAt: CreationOptional<Date | null>;
  declare createdAt: CreationOptional<Date>;
  declare saver?: NonAttribute<User | null>;
  declare approver?: NonAttribute<User | null>;

  static initModel(sequelize: Sequelize): void {
    FindingsRevision.init(
      {
        id: { type: DataTypes.UUID, defaultValue: DataTypes.UUIDV4, primaryKey: true },
        revision: { type: DataTypes.INTEGER, allowNull: false },
        outcomeNodeId: { type: DataTypes.STRING(80), allowNull: false },
        concern: { type: DataTypes.TEXT, allowNull: false },
        cause: { type: DataTypes.TEXT, allowNull: false },
        correction: { type: DataTypes.TEXT, allowNull: false },
        parts: { type: DataTypes.JSONB, allowNull: false },
        labour: { type: DataTypes.JSONB, allowNull: false },
        followUps: { type: DataTypes.JSONB, allowNull: false },
        readings: { type: DataTypes.JSONB, allowNull: false },
        photoIds: { type: DataTypes.JSONB, allowNull: false, defaultValue: [] },
        approvedAt: { type: DataTypes.DATE, allowNull: true },
        createdAt: DataTypes.DATE,
      },
      {
        sequelize,
        tableName: 'findings_revisions',
        modelName: 'FindingsRevision',
        updatedAt: false,
      },
    );
  }
}
