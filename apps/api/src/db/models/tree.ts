// A workshop's decision tree: a stable identity whose content lives in its versions.
import { DataTypes, Model } from 'sequelize';
import type {
  CreationOptional,
  ForeignKey,
  InferAttributes,
  InferCreationAttributes,
  Sequelize,
} from 'sequelize';
import type { Workshop } from './workshop';

export class Tree extends Model<InferAttributes<Tree>, InferCreationAttributes<Tree>> {
  declare id: CreationOptional<string>;
  declare workshopId: ForeignKey<Workshop['id']>;
  declare key: string;
  declare title: string;
  declare symptom: string;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;

  static initModel(sequelize: Sequelize): void {
    Tree.init(
      {
        id: { type: DataTypes.UUID, defaultValue: DataTypes.UUIDV4, primaryKey: true },
        key: { type: DataTypes.STRING(80), allowNull: false },
        title: { type: DataTypes.STRING(200), allowNull: false },
        symptom: { type: DataTypes.STRING(300), allowNull: false },
        createdAt: DataTypes.DATE,
        updatedAt: DataTypes.DATE,
      },
      { sequelize, tableName: 'trees', modelName: 'Tree' },
    );
  }
}
