// One version of a tree: a draft the lead edits, or a published version that the database
// itself refuses to change (see migration 0002's trigger).
import { DataTypes, Model } from 'sequelize';
import type {
  CreationOptional,
  ForeignKey,
  InferAttributes,
  InferCreationAttributes,
  NonAttribute,
  Sequelize,
} from 'sequelize';
import type { Tree } from './tree';
import type { User } from './user';
import type { Workshop } from './workshop';

export type TreeVersionStatus = 'draft' | 'published' | 'retired';

export interface PublishConfirmation {
  confirmedBy: string;
  confirmedAt: string;
  changedCases: { caseId: string; reference: string; from: string | null; to: string | null }[];
}

export class TreeVersion extends Model<
  InferAttributes<TreeVersion>,
  InferCreationAttributes<TreeVersion>
> {
  declare id: CreationOptional<string>;
  declare treeId: ForeignKey<Tree['id']>;
  declare workshopId: ForeignKey<Workshop['id']>;
  declare version: number;
  declare status: CreationOptional<TreeVersionStatus>;
  // The tree definition as packages/fault-tree validates it; parsed where it is used.
  declare definition: unknown;
  declare changeNote: string | null;
  declare revision: CreationOptional<number>;
  declare createdBy: ForeignKey<User['id']> | null;
  declare publishedBy: ForeignKey<User['id']> | null;
  declare publishedAt: Date | null;
  declare retiredAt: CreationOptional<Date | null>;
  /** Set when a publish went ahead although regression cases would reach another outcome. */
  declare publishConfirmation: CreationOptional<PublishConfirmation | null>;
  declare basedOnVersion: CreationOptional<number | null>;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;
  declare tree?: NonAttribute<Tree>;

  static initModel(sequelize: Sequelize): void {
    TreeVersion.init(
      {
        id: { type: DataTypes.UUID, defaultValue: DataTypes.UUIDV4, primaryKey: true },
        version: { type: DataTypes.INTEGER, allowNull: false },
        status: {
          type: DataTypes.ENUM('draft', 'published', 'retired'),
          allowNull: false,
          defaultValue: 'draft',
        },
        definition: { type: DataTypes.JSONB, allowNull: false },
        changeNote: { type: DataTypes.TEXT, allowNull: true },
        revision: { type: DataTypes.INTEGER, allowNull: false, defaultValue: 1 },
        publishedAt: { type: DataTypes.DATE, allowNull: true },
        retiredAt: { type: DataTypes.DATE, allowNull: true },
        publishConfirmation: { type: DataTypes.JSONB, allowNull: true },
        basedOnVersion: { type: DataTypes.INTEGER, allowNull: true },
        createdAt: DataTypes.DATE,
        updatedAt: DataTypes.DATE,
      },
      { sequelize, tableName: 'tree_versions', modelName: 'TreeVersion' },
    );
  }
}
