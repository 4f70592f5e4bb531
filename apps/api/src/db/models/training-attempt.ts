// One apprentice's scored run through a training case; its predictions are rows of their own.
import { DataTypes, Model } from 'sequelize';
import type {
  CreationOptional,
  ForeignKey,
  InferAttributes,
  InferCreationAttributes,
  NonAttribute,
  Sequelize,
} from 'sequelize';
import type { TrainingCase } from './training-case';
import type { TrainingPrediction } from './training-prediction';
import type { User } from './user';
import type { Workshop } from './workshop';

export class TrainingAttempt extends Model<
  InferAttributes<TrainingAttempt>,
  InferCreationAttributes<TrainingAttempt>
> {
  declare id: CreationOptional<string>;
  declare workshopId: ForeignKey<Workshop['id']>;
  declare trainingCaseId: ForeignKey<TrainingCase['id']>;
  declare apprenticeId: ForeignKey<User['id']>;
  declare status: CreationOptional<'in_progress' | 'finished'>;
  declare score: CreationOptional<number>;
  declare maxScore: number;
  declare startedAt: CreationOptional<Date>;
  declare finishedAt: CreationOptional<Date | null>;
  declare predictions?: NonAttribute<TrainingPrediction[]>;
  declare trainingCase?: NonAttribute<TrainingCase>;

  static initModel(sequelize: Sequelize): void {
    TrainingAttempt.init(
      {
        id: { type: DataTypes.UUID, defaultValue: DataTypes.UUIDV4, primaryKey: true },
        status: { type: DataTypes.STRING(20), allowNull: false, defaultValue: 'in_progress' },
        score: { type: DataTypes.INTEGER, allowNull: false, defaultValue: 0 },
        maxScore: { type: DataTypes.INTEGER, allowNull: false },
        startedAt: { type: DataTypes.DATE, allowNull: false, defaultValue: DataTypes.NOW },
        finishedAt: { type: DataTypes.DATE, allowNull: true },
      },
      {
        sequelize,
        tableName: 'training_attempts',
        modelName: 'TrainingAttempt',
        timestamps: false,
      },
    );
  }
}
