// One entry in a case's history: an answer, a step back, a note, a status change. Never
// updated or deleted; the walk and the audit trail are both read from these.
import { DataTypes, Model } from 'sequelize';
import type {
  CreationOptional,
  ForeignKey,
  InferAttributes,
  InferCreationAttributes,
  NonAttribute,
  Sequelize,
} from 'sequelize';
import type { DiagnosticCase } from './diagnostic-case';
import type { User } from './user';
import type { Workshop } from './workshop';

export const caseEventKinds = [
  'answer',
  'back',
  'note',
  'status',
  'attachment',
  'findings',
  'approval',
  'mail',
] as const;
export type CaseEventKind = (typeof caseEventKinds)[number];

export class CaseEvent extends Model<
  InferAttributes<CaseEvent>,
  InferCreationAttributes<CaseEvent>
> {
  declare id: CreationOptional<string>;
  declare caseId: ForeignKey<DiagnosticCase['id']>;
  declare workshopId: ForeignKey<Workshop['id']>;
  declare seq: number;
  declare kind: CaseEventKind;
  declare nodeId: string | null;
  declare payload: CreationOptional<Record<string, unknown>>;
  declare idempotencyKey: string | null;
  declare actorId: ForeignKey<User['id']>;
  declare createdAt: CreationOptional<Date>;
  declare actor?: NonAttribute<User>;

  static initModel(sequelize: Sequelize): void {
    CaseEvent.init(
      {
        id: { type: DataTypes.UUID, defaultValue: DataTypes.UUIDV4, primaryKey: true },
        seq: { type: DataTypes.INTEGER, allowNull: false },
        kind: { type: DataTypes.STRING(30), allowNull: false },
        nodeId: { type: DataTypes.STRING(80), allowNull: true },
        payload: { type: DataTypes.JSONB, allowNull: false, defaultValue: {} },
        idempotencyKey: { type: DataTypes.STRING(100), allowNull: true },
        createdAt: DataTypes.DATE,
      },
      { sequelize, tableName: 'case_events', modelName: 'CaseEvent', updatedAt: false },
    );
  }
}
