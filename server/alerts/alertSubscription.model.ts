import { DataTypes, Model, type CreationOptional, type InferAttributes, type InferCreationAttributes, type Sequelize } from 'sequelize';
import type { SubscriptionLevel, SubscriptionTopic } from '../../shared/schemas/alerts';

/** A user's own choice for one rule (or the digest); without a row the role's default applies. */
export class AlertSubscription extends Model<InferAttributes<AlertSubscription>, InferCreationAttributes<AlertSubscription>> {
  declare userId: number;
  declare topic: SubscriptionTopic;
  declare level: SubscriptionLevel;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;

  static initModel(sequelize: Sequelize) {
    AlertSubscription.init(
      {
        userId: { type: DataTypes.INTEGER.UNSIGNED, primaryKey: true },
        topic: { type: DataTypes.STRING(32), primaryKey: true },
        level: { type: DataTypes.ENUM('all', 'critical', 'off'), allowNull: false },
        createdAt: DataTypes.DATE(3),
        updatedAt: DataTypes.DATE(3),
      },
      { sequelize, tableName: 'alert_subscriptions' },
    );
  }
}
