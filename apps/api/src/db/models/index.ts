// Attaches every model to a Sequelize instance and declares their associations.
import type { Sequelize } from 'sequelize';
import { User } from './user';
import { Workshop } from './workshop';

export { User, Workshop };

export function initModels(sequelize: Sequelize): void {
  Workshop.initModel(sequelize);
  User.initModel(sequelize);
  Workshop.hasMany(User, { foreignKey: 'workshopId', as: 'users' });
  User.belongsTo(Workshop, { foreignKey: 'workshopId', as: 'workshop' });
}
