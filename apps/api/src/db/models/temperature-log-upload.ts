// A log upload waiting for a person to say which column is which. The original file is already
// in storage under `storageKey`; finishing the mapping turns it into a stored log without
// uploading it again. Abandoned uploads expire (see services/temperature-logs/pending-uploads.ts).
import { DataTypes, Model } from 'sequelize';
import type {
  CreationOptional,
  ForeignKey,
  InferAttributes,
  InferCreationAttributes,
  Sequelize,
} from 'sequelize';
import type { DiagnosticCase } from './diagnostic-case';
import type { User } from './user';
import type { Workshop } from './workshop';

export class TemperatureLogUpload extends Model<
  InferAttributes<TemperatureLogUpload>,
  InferCreationAttributes<TemperatureLogUpload>
> {
  declare id: CreationOptional<string>;
  declare workshopId: ForeignKey<Workshop['id']>;
  declare caseId: ForeignKey<DiagnosticCase['id']>;
  declare nodeId: string | null;
  declare storageKey: string;
  declare originalName: string;
  declare byteSize: number;
  declare sourceSignature: string;
  declare uploadedBy: ForeignKey<User['id']>;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;

  static initModel(sequelize: Sequelize): void {
    TemperatureLogUpload.init(
      {
        id: { type: DataTypes.UUID, defaultValue: DataTypes.UUIDV4, primaryKey: true },
        nodeId: { type: DataTypes.STRING(80), allowNull: true },
        storageKey: { type: DataTypes.STRING(200), allowNull: false },
        originalName: { type: DataTypes.STRING(255), allowNull: false },
        byteSize: { type: DataTypes.INTEGER, allowNull: false },
        sourceSignature: { type: DataTypes.STRING(40), allowNull: false },
        createdAt: DataTypes.DATE,
        updatedAt: DataTypes.DATE,
      },
      { sequelize, tableName: 'temperature_log_uploads', modelName: 'TemperatureLogUpload' },
    );
  }
}
