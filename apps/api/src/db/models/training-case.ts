// A finished case the lead keeps for teaching: the note, how hard it is, and what apprentices
// must not see beyond the customer's details (which are always hidden).
import { DataTypes, Model } from 'sequelize';
import type {
  CreationOptional,
  ForeignKey,
  InferAttributes,
  InferCreationAttributes,
  NonAttribute,
  Sequelize,
} from 'sequelize';
import type { TrainingDifficulty } from '@heatpath/contracts';
import type { DiagnosticCase } from './diagnostic-case';
import type { User } from './user';
import type { Workshop } from './workshop';

export class TrainingCase extends Model<
  InferAttributes<TrainingCase>,
  InferCreationAttributes<TrainingCase>
> {
  declare id: CreationOptional<string>;
  declare workshopId: ForeignKey<Workshop['id']>;
  declare caseId: ForeignKey<DiagnosticCase['id']>;
  declare teachingNote: string;
  declare difficulty: TrainingDifficulty;
  declare hideNotes: CreationOptional<boolean>;
  declare hiddenAttachmentIds: CreationOptional<string[]>;
  declare withdrawn: CreationOptional<boolean>;
  declare markedBy: ForeignKey<User['id']>;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;
  declare case?: NonAttribute<DiagnosticCase>;
  declare marker?: NonAttribute<User>;

  static initModel(sequelize: Sequelize): void {
    TrainingCase.init(
      {
        id: { type: DataTypes.UUID, defaultValue: DataTypes.UUIDV4, primaryKey: true },
        teachingNote: { type: DataTypes.TEXT, allowNull: false },
        difficulty: { type: DataTypes.STRING(20), allowNull: false },
        hideNotes: { type: DataTypes.BOOLEAN, allowNull: false, defaultValue: false },
        hiddenAttachmentIds: {
          type: DataTypes.ARRAY(DataTypes.UUID),
          allowNull: false,
          defaultValue: [],
        },
        withdrawn: { type: DataTypes.BOOLEAN, allowNull: false, defaultValue: false },
        createdAt: DataTypes.DATE,
        updatedAt: DataTypes.DATE,
      },
      { sequelize, tableName: 'training_cases', modelName: 'TrainingCase' },
    );
  }
}
