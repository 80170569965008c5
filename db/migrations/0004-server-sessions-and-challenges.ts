import { DataTypes, type QueryInterface } from "sequelize";
import type { MigrationFn } from "umzug";

// Sessions and sign-in challenges live on the server; a browser holds only random ids, stored here as SHA-256
// hashes so that a copy of the database signs nobody in. Rate-limit counters (rate-limiter-flexible's own table
// shape) live here too, so that every app instance shares them.
export const up: MigrationFn<QueryInterface> = async ({ context: qi }) => {
  await qi.createTable("sessions", {
    id_hash: { type: DataTypes.TEXT, primaryKey: true },
    user_id: { type: DataTypes.UUID, allowNull: true, references: { model: "users", key: "id" }, onDelete: "CASCADE" },
    data: { type: DataTypes.JSONB, allowNull: false, defaultValue: {} },
    created_at: { type: DataTypes.DATE, allowNull: false },
    last_seen_at: { type: DataTypes.DATE, allowNull: false },
    expires_at: { type: DataTypes.DATE, allowNull: false },
  });
  await qi.addIndex("sessions", ["user_id"]);
  await qi.addIndex("sessions", ["expires_at"]);

  await qi.createTable("sign_in_challenges", {
    id_hash: { type: DataTypes.TEXT, primaryKey: true },
    email: { type: DataTypes.TEXT, allowNull: false },
    // The strategy's sealed code state, exactly as issued; only this spelling is ever handed back to it.
    sealed_code: { type: DataTypes.TEXT, allowNull: false },
    redirect_to: { type: DataTypes.TEXT, allowNull: true },
    attempts: { type: DataTypes.INTEGER, allowNull: false, defaultValue: 0 },
    last_error: { type: DataTypes.TEXT, allowNull: true },
    created_at: { type: DataTypes.DATE, allowNull: false },
    expires_at: { type: DataTypes.DATE, allowNull: false },
    consumed_at: { type: DataTypes.DATE, allowNull: true },
  });
  await qi.addIndex("sign_in_challenges", ["created_at"]);
  await qi.sequelize.query(
    `ALTER TABLE sign_in_challenges ADD CONSTRAINT sign_in_challenges_error_known
       CHECK (last_error IS NULL OR last_error IN ('invalid-code', 'expired', 'too-many-attempts', 'used', 'no-account'))`,
  );

  await qi.createTable("rate_limits", {
    key: { type: DataTypes.STRING(255), primaryKey: true },
    points: { type: DataTypes.INTEGER, allowNull: false, defaultValue: 0 },
    expire: { type: DataTypes.BIGINT, allowNull: true },
  });

  // Wrong codes are now counted on the challenge itself.
  await qi.dropTable("sign_in_failures");
};

export const down: MigrationFn<QueryInterface> = async ({ context: qi }) => {
  await qi.createTable("sign_in_failures", {
    challenge_hash: { type: DataTypes.TEXT, primaryKey: true },
    failures: { type: DataTypes.INTEGER, allowNull: false, defaultValue: 0 },
    created_at: { type: DataTypes.DATE, allowNull: false },
  });
  await qi.dropTable("rate_limits");
  await qi.dropTable("sign_in_challenges");
  await qi.dropTable("sessions");
};
