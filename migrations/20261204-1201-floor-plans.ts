import { DataTypes, type QueryInterface } from "sequelize";

// Floor plans: one drawing per floor (the image in object storage, its size in pixels and its scale), the devices
// placed on it (plan pixels), and cable routes drawn from a device to its board across one or more floors. A
// detector's cable length says where it came from: typed, or measured on the plan.
const id = { type: DataTypes.INTEGER.UNSIGNED, autoIncrement: true, primaryKey: true };
const ref = (table: string, allowNull = false) => ({ type: DataTypes.INTEGER.UNSIGNED, allowNull, references: { model: table, key: "id" }, onDelete: "CASCADE" });
const stamps = { created_at: { type: DataTypes.DATE, allowNull: false }, updated_at: { type: DataTypes.DATE, allowNull: false } };
const itemKinds = ["detector", "panel", "expansion-board", "keypad", "power-supply", "sounder", "riser"];

export async function up({ context: qi }: { context: QueryInterface }) {
  await qi.createTable("floor_plans", {
    id,
    site_id: ref("sites"),
    floor_id: { ...ref("floors"), unique: true },
    s3_key: { type: DataTypes.STRING(512), allowNull: false, unique: true },
    file_name: { type: DataTypes.STRING(100), allowNull: false },
    content_type: { type: DataTypes.STRING(40), allowNull: false },
    size_bytes: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false },
    width_px: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false },
    height_px: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false },
    metres_per_pixel: { type: DataTypes.DOUBLE, allowNull: true },
    calibration: { type: DataTypes.JSON, allowNull: true },
    uploaded_by: { type: DataTypes.INTEGER.UNSIGNED, allowNull: true, references: { model: "users", key: "id" }, onDelete: "SET NULL" },
    ...stamps,
  });
  await qi.createTable("plan_items", {
    id,
    plan_id: ref("floor_plans"),
    kind: { type: DataTypes.ENUM(...itemKinds), allowNull: false },
    detector_id: { ...ref("schedule_detectors", true), unique: true },
    label: { type: DataTypes.STRING(200), allowNull: false, defaultValue: "" },
    x: { type: DataTypes.DOUBLE, allowNull: false },
    y: { type: DataTypes.DOUBLE, allowNull: false },
    ...stamps,
  });
  await qi.createTable("plan_routes", {
    id,
    site_id: ref("sites"),
    from_item_id: { ...ref("plan_items"), unique: true },
    to_item_id: ref("plan_items"),
    legs: { type: DataTypes.JSON, allowNull: false },
    device_slack_m: { type: DataTypes.DOUBLE, allowNull: false },
    board_slack_m: { type: DataTypes.DOUBLE, allowNull: false },
    rise_m: { type: DataTypes.DOUBLE, allowNull: false },
    ...stamps,
  });
  await qi.addColumn("schedule_detectors", "cable_basis", { type: DataTypes.ENUM("typed", "measured-on-plan"), allowNull: false, defaultValue: "typed" });
}

export async function down({ context: qi }: { context: QueryInterface }) {
  await qi.removeColumn("schedule_detectors", "cable_basis");
  for (const t of ["plan_routes", "plan_items", "floor_plans"]) await qi.dropTable(t);
}
