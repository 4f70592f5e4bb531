// One training case at one position in a course.
import { DataTypes, Model } from 'sequelize';
import type {
  ForeignKey,
  InferAttributes,
  InferCreationAttributes,
  NonAttribute,
  Sequelize,
} from 'sequelize';
import type { TrainingCase } from './training-case';
import type { TrainingCourse } from './training-course';

export class TrainingCourseItem extends Model<
  InferAttributes<TrainingCourseItem>,
  InferCreationAttributes<TrainingCourseItem>
> {
  declare courseId: ForeignKey<TrainingCourse['id']>;
  declare trainingCaseId: ForeignKey<TrainingCase['id']>;
  declare position: number;
  declare trainingCase?: NonAttribute<TrainingCase>;

  static initModel(sequelize: Sequelize): void {
    TrainingCourseItem.init(
      {
        courseId: { type: DataTypes.UUID, primaryKey: true },
        trainingCaseId: { type: DataTypes.UUID, primaryKey: true },
        position: { type: DataTypes.INTEGER, allowNull: false },
      },
      {
        sequelize,
        tableName: 'training_course_items',
        modelName: 'TrainingCourseItem',
        timestamps: false,
      },
    );
  }
}
