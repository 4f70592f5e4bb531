// One prediction of an attempt, stored as it is made and never changed.
import { DataTypes, Model } from 'sequelize';
import type {
  CreationOptional,
  ForeignKey,
  InferAttributes,
  InferCreationAttributes,
  Sequelize,
} from 'sequelize';
import type { PredictionKind } from '@heatpath/contracts';
import type { TrainingAttempt } from './training-attempt';
import type { Workshop } from './workshop';

export class TrainingPrediction extends Model<
  InferAttributes<TrainingPrediction>,
  InferCreationAttributes<TrainingPrediction>
> {
  declare attemptId: ForeignKey<TrainingAttempt['id']>;
  declare stepIndex: number;
  declare workshopId: ForeignKey<Workshop['id']>;
  declare kind: PredictionKind;
  declare nodeId: string;
  declare stepTitle: string;
  declare chosenId: string;
  declare correctId: string;
  declare points: number;
  declare maxPoints: number;
  declare createdAt: CreationOptional<Date>;

  static initModel(sequelize: Sequelize): void {
    TrainingPrediction.init(
      {
        attemptId: { type: DataTypes.UUID, primaryKey: true },
        stepIndex: { type: DataTypes.INTEGER, primaryKey: true },
        kind: { type: DataTypes.STRING(20), allowNull: false },
        nodeId: { type: DataTypes.STRING(80), allowNull: false },
        stepTitle: { type: DataTypes.STRING(200), allowNull: false },
        chosenId: { type: DataTypes.STRING(120), allowNull: false },
        correctId: { type: DataTypes.STRING(120), allowNull: false },
        points: { type: DataTypes.INTEGER, allowNull: false },
        maxPoints: { type: DataTypes.INTEGER, allowNull: false },
        createdAt: DataTypes.DATE,
      },
      {
        sequelize,
        tableName: 'training_predictions',
        modelName: 'TrainingPrediction',
        updatedAt: false,
      },
    );
  }
}
