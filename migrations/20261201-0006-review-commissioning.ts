import { DataTypes, type QueryInterface } from "sequelize";

// Review and commissioning: each layout's review state, comments, the decision log (review steps and the
// choice among compared layouts, each with its reason), commissioning readings and photos.
const id = { type: DataTypes.INTEGER.UNSIGNED, autoIncrement: true, primaryKey: true };
const createdAt = { created_at: { type: DataTypes.DATE, allowNull: false } };
const layoutRef = { type: DataTypes.INTEGER.UNSIGNED, allowNull: false, references: { model: "layouts", key: "id" }, onDelete: "CASCADE" };
const userRef = { type: DataTypes.INTEGER.UNSIGNED, allowNull: true, references: { model: "users", key: "id" }, onDelete: "SET NULL" };
const revision = { type: DataTypes.INTEGER.UNSIGNED, allowNull: false };

export async function up({ context: qi }: { context: QueryInterface }) {
  await qi.createTable("layout_reviews", {
    layout_id: { ...layoutRef, primaryKey: true },
    // draft | in-review | approved | commissioned, for `revision`; a later revision of the layout is a new draft.
    state: { type: DataTypes.STRING(20), allowNull: false },
    revision,
    // The latest approved revision stays frozen (and is the one the terminal sheet and commissioning use) while a newer draft is made.
    approved_revision: { type: DataTypes.INTEGER.UNSIGNED, allowNull: true },
    commissioned_revision: { type: DataTypes.INTEGER.UNSIGNED, allowNull: true },
    submitted_by: userRef,
    submitted_at: { type: DataTypes.DATE, allowNull: true },
    approved_by: userRef,
    approved_at: { type: DataTypes.DATE, allowNull: true },
    commissioned_by: userRef,
    commissioned_at: { type: DataTypes.DATE, allowNull: true },
    updated_at: { type: DataTypes.DATE, allowNull: false },
  });

  await qi.createTable("layout_comments", {
    id,
    layout_id: layoutRef,
    revision,
    author_id: userRef,
    body: { type: DataTypes.TEXT, allowNull: false },
    // What the comment is about, as a finding target ({ kind: "input", boardKey, input } ...); null for the whole layout.
    target: { type: DataTypes.JSON, allowNull: true },
    ...createdAt,
  });
  await qi.addIndex("layout_comments", ["layout_id", "created_at"]);

  await qi.createTable("layout_decisions", {
    id,
    layout_id: layoutRef,
    revision,
    // submit | withdraw | approve | reject | commission | choose (picked among compared layouts)
    kind: { type: DataTypes.STRING(20), allowNull: false },
    reason: { type: DataTypes.TEXT, allowNull: false },
    compared_layout_ids: { type: DataTypes.JSON, allowNull: true },
    decided_by: userRef,
    ...createdAt,
  });
  await qi.addIndex("layout_decisions", ["layout_id", "created_at"]);

  await qi.createTable("commissioning_readings", {
    id,
    layout_id: layoutRef,
    revision,
    board_key: { type: DataTypes.STRING(40), allowNull: false },
    input: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false },
    test_state: { type: DataTypes.STRING(20), allowNull: false },
    measured_ohms: { type: DataTypes.DOUBLE, allowNull: true },
    is_open: { type: DataTypes.BOOLEAN, allowNull: false },
    verdict: { type: DataTypes.ENUM("pass", "fail"), allowNull: false },
    diagnosis: { type: DataTypes.TEXT, allowNull: true },
    diagnosis_codes: { type: DataTypes.JSON, allowNull: false },
    recorded_by: userRef,
    // Made by the client once per reading, so a retried request stores it once.
    client_id: { type: DataTypes.CHAR(36), allowNull: false, unique: true },
    ...createdAt,
  });
  await qi.addIndex("commissioning_readings", ["layout_id", "revision", "board_key", "input"]);
  // A reading is either ohms or open, never both or neither.
  await qi.sequelize.query(
    "ALTER TABLE commissioning_readings ADD CONSTRAINT commissioning_readings_ohms_or_open CHECK ((is_open = 1 AND measured_ohms IS NULL) OR (is_open = 0 AND measured_ohms IS NOT NULL AND measured_ohms >= 0))",
  );

  await qi.createTable("commissioning_photos", {
    id,
    layout_id: layoutRef,
    revision,
    board_key: { type: DataTypes.STRING(40), allowNull: true },
    input: { type: DataTypes.INTEGER.UNSIGNED, allowNull: true },
    s3_key: { type: DataTypes.STRING(512), allowNull: false, unique: true },
    file_name: { type: DataTypes.STRING(100), allowNull: false },
    content_type: { type: DataTypes.STRING(40), allowNull: false },
    size_bytes: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false },
    uploaded_by: userRef,
    client_id: { type: DataTypes.CHAR(36), allowNull: true, unique: true },
    ...createdAt,
  });
  await qi.addIndex("commissioning_photos", ["layout_id", "revision"]);
}

export async function down({ context: qi }: { context: QueryInterface }) {
  for (const t of ["commissioning_photos", "commissioning_readings", "layout_decisions", "layout_comments", "layout_reviews"]) await qi.dropTable(t);
}
