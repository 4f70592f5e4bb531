// An ordered set of training cases for one apprentice, or for every apprentice (apprenticeId null).
import { DataTypes, Model } from 'sequelize';
import type {
  CreationOptional,
  ForeignKey,
  InferAttributes,
  InferCreationAttributes,
  NonAttribute,
  Sequelize,
} from 'sequelize';
import type { TrainingCourseItem } from './training-course-item';
import type { User } from './user';
import type { Workshop } from './workshop';

export class TrainingCourse extends Model<
  InferAttributes<TrainingCourse>,
  InferCreationAttributes<TrainingCourse>
> {
  declare id: CreationOptional<string>;
  declare workshopId: ForeignKey<Workshop['id']>;
  declare title: string;
  declare description: string | null;
  declare apprenticeId: ForeignKey<User['id']> | null;
  declare createdBy: ForeignKey<User['id']>;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;
  declare items?: NonAttribute<TrainingCourseItem[]>;
  declare apprentice?: NonAttribute<User | null>;

  static initModel(sequelize: Sequelize): void {
    TrainingCourse.init(
      {
        id: { type: DataTypes.UUID, defaultValue: DataTypes.UUIDV4, primaryKey: true },
        title: { type: DataTypes.STRING(160), allowNull: false },
        description: { type: DataTypes.TEXT, allowNull: true },
        createdAt: DataTypes.DATE,
        updatedAt: DataTypes.DATE,
      },
      { sequelize, tableName: 'training_courses', modelName: 'TrainingCourse' },
    );
  }
}
