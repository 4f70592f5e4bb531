// The lead's record that an apprentice completed a course: who signed, when, and a note.
import { DataTypes, Model } from 'sequelize';
import type {
  CreationOptional,
  ForeignKey,
  InferAttributes,
  InferCreationAttributes,
  NonAttribute,
  Sequelize,
} from 'sequelize';
import type { TrainingCourse } from './training-course';
import type { User } from './user';
import type { Workshop } from './workshop';

export class TrainingSignOff extends Model<
  InferAttributes<TrainingSignOff>,
  InferCreationAttributes<TrainingSignOff>
> {
  declare courseId: ForeignKey<TrainingCourse['id']>;
  declare apprenticeId: ForeignKey<User['id']>;
  declare workshopId: ForeignKey<Workshop['id']>;
  declare signedBy: ForeignKey<User['id']>;
  declare note: string | null;
  declare signedAt: CreationOptional<Date>;
  declare signer?: NonAttribute<User>;

  static initModel(sequelize: Sequelize): void {
    TrainingSignOff.init(
      {
        courseId: { type: DataTypes.UUID, primaryKey: true },
        apprenticeId: { type: DataTypes.UUID, primaryKey: true },
        note: { type: DataTypes.TEXT, allowNull: true },
        signedAt: { type: DataTypes.DATE, allowNull: false, defaultValue: DataTypes.NOW },
      },
      {
        sequelize,
        tableName: 'training_sign_offs',
        modelName: 'TrainingSignOff',
        timestamps: false,
      },
    );
  }
}
