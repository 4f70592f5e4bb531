// The column mapping a workshop confirmed for one source of logs (one export layout of a scan tool
// or logger, named by the parser's source signature). Applied to the next upload from that source.
import { DataTypes, Model } from 'sequelize';
import type {
  CreationOptional,
  ForeignKey,
  InferAttributes,
  InferCreationAttributes,
  Sequelize,
} from 'sequelize';
import type { ResolvedMapping } from '@heatpath/temperature-log';
import type { User } from './user';
import type { Workshop } from './workshop';

export class TemperatureLogMapping extends Model<
  InferAttributes<TemperatureLogMapping>,
  InferCreationAttributes<TemperatureLogMapping>
> {
  declare id: CreationOptional<string>;
  declare workshopId: ForeignKey<Workshop['id']>;
  declare sourceSignature: string;
  declare mapping: ResolvedMapping;
  declare confirmedBy: ForeignKey<User['id']>;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;

  static initModel(sequelize: Sequelize): void {
    TemperatureLogMapping.init(
      {
        id: { type: DataTypes.UUID, defaultValue: DataTypes.UUIDV4, primaryKey: true },
        sourceSignature: { type: DataTypes.STRING(40), allowNull: false },
        mapping: { type: DataTypes.JSONB, allowNull: false },
        createdAt: DataTypes.DATE,
        updatedAt: DataTypes.DATE,
      },
      { sequelize, tableName: 'temperature_log_mappings', modelName: 'TemperatureLogMapping' },
    );
  }
}
