// A temperature log on a case (optionally on one step): the parsed series, how it was read and
// its analysis at the default settings. The original file is the attachment it points at. Each
// channel is a float64 column (little-endian, NaN for an empty cell; see
// services/temperature-logs/series-columns.ts): a 100,000-reading log is 800 KB per channel and
// needs no JSON parse to read back.
import { DataTypes, Model } from 'sequelize';
import type {
  CreationOptional,
  ForeignKey,
  InferAttributes,
  InferCreationAttributes,
  NonAttribute,
  Sequelize,
} from 'sequelize';
import type { MappingSource } from '@heatpath/contracts';
import type {
  CandidateColumn,
  DetectedFormat,
  ResolvedMapping,
  TemperatureLogAnalysis,
} from '@heatpath/temperature-log';
import type { Attachment } from './attachment';
import type { DiagnosticCase } from './diagnostic-case';
import type { User } from './user';
import type { Workshop } from './workshop';

export class TemperatureLog extends Model<
  InferAttributes<TemperatureLog>,
  InferCreationAttributes<TemperatureLog>
> {
  declare id: CreationOptional<string>;
  declare workshopId: ForeignKey<Workshop['id']>;
  declare caseId: ForeignKey<DiagnosticCase['id']>;
  declare nodeId: string | null;
  declare attachmentId: ForeignKey<Attachment['id']>;
  declare sourceSignature: string;
  declare mapping: ResolvedMapping;
  declare mappingSource: MappingSource;
  /** The file's columns as the mapping form shows them; null when the file mapped itself. */
  declare columns: CandidateColumn[] | null;
  declare detected: DetectedFormat;
  declare readings: number;
  declare skippedRows: number;
  declare durationSeconds: number;
  declare startedAtText: string | null;
  declare times: Buffer;
  declare coolantC: Buffer;
  declare intakeAirC: Buffer | null;
  declare ambientC: Buffer | null;
  declare vehicleSpeedKph: Buffer | null;
  declare engineSpeedRpm: Buffer | null;
  declare fanDuty: Buffer | null;
  declare analysis: TemperatureLogAnalysis;
  declare uploadedBy: ForeignKey<User['id']>;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;
  declare attachment?: NonAttribute<Attachment>;
  declare uploader?: NonAttribute<User>;

  static initModel(sequelize: Sequelize): void {
    TemperatureLog.init(
      {
        id: { type: DataTypes.UUID, defaultValue: DataTypes.UUIDV4, primaryKey: true },
        nodeId: { type: DataTypes.STRING(80), allowNull: true },
        sourceSignature: { type: DataTypes.STRING(40), allowNull: false },
        mapping: { type: DataTypes.JSONB, allowNull: false },
        mappingSource: {
          type: DataTypes.STRING(20),
          allowNull: false,
          validate: { isIn: [['detected', 'confirmed', 'remembered']] },
        },
        columns: { type: DataTypes.JSONB, allowNull: true },
        detected: { type: DataTypes.JSONB, allowNull: false },
        readings: { type: DataTypes.INTEGER, allowNull: false },
        skippedRows: { type: DataTypes.INTEGER, allowNull: false, defaultValue: 0 },
        durationSeconds: { type: DataTypes.DOUBLE, allowNull: false },
        startedAtText: { type: DataTypes.STRING(64), allowNull: true },
        times: { type: DataTypes.BLOB, allowNull: false },
        coolantC: { type: DataTypes.BLOB, allowNull: false },
        intakeAirC: { type: DataTypes.BLOB, allowNull: true },
        ambientC: { type: DataTypes.BLOB, allowNull: true },
        vehicleSpeedKph: { type: DataTypes.BLOB, allowNull: true },
        engineSpeedRpm: { type: DataTypes.BLOB, allowNull: true },
        fanDuty: { type: DataTypes.BLOB, allowNull: true },
        analysis: { type: DataTypes.JSONB, allowNull: false },
        createdAt: DataTypes.DATE,
        updatedAt: DataTypes.DATE,
      },
      { sequelize, tableName: 'temperature_logs', modelName: 'TemperatureLog' },
    );
  }
}
