// A finished case a lead keeps in a tree's regression set: every new draft is replayed against it.
import { DataTypes, Model } from 'sequelize';
import type {
  CreationOptional,
  ForeignKey,
  InferAttributes,
  InferCreationAttributes,
  Sequelize,
} from 'sequelize';
import type { DiagnosticCase } from './diagnostic-case';
import type { Tree } from './tree';
import type { User } from './user';
import type { Workshop } from './workshop';

export class RegressionCase extends Model<
  InferAttributes<RegressionCase>,
  InferCreationAttributes<RegressionCase>
> {
  declare treeId: ForeignKey<Tree['id']>;
  declare caseId: ForeignKey<DiagnosticCase['id']>;
  declare workshopId: ForeignKey<Workshop['id']>;
  declare addedBy: ForeignKey<User['id']>;
  declare createdAt: CreationOptional<Date>;

  static initModel(sequelize: Sequelize): void {
    RegressionCase.init(
      {
        treeId: { type: DataTypes.UUID, primaryKey: true },
        caseId: { type: DataTypes.UUID, primaryKey: true },
        createdAt: DataTypes.DATE,
      },
      {
        sequelize,
        tableName: 'tree_regression_cases',
        modelName: 'RegressionCase',
        updatedAt: false,
      },
    );
  }
}
