using System;
using Microsoft.EntityFrameworkCore.Migrations;
using Npgsql.EntityFrameworkCore.PostgreSQL.Metadata;

#nullable disable

namespace Decide.Data.Postgres.Migrations
{
    /// <inheritdoc />
    public partial class Initial : Migration
    {
        /// <inheritdoc />
        protected override void Up(MigrationBuilder migrationBuilder)
        {
            migrationBuilder.CreateTable(
                name: "AspNetRoles",
                columns: table => new
                {
                    Id = table.Column<string>(type: "character varying(4000)", maxLength: 4000, nullable: false),
                    Name = table.Column<string>(type: "character varying(256)", maxLength: 256, nullable: true),
                    NormalizedName = table.Column<string>(type: "character varying(256)", maxLength: 256, nullable: true),
                    ConcurrencyStamp = table.Column<string>(type: "character varying(4000)", maxLength: 4000, nullable: true)
                },
                constraints: table =>
                {
                    table.PrimaryKey("PK_AspNetRoles", x => x.Id);
                });

            migrationBuilder.CreateTable(
                name: "AspNetUsers",
                columns: table => new
                {
                    Id = table.Column<string>(type: "character varying(4000)", maxLength: 4000, nullable: false),
                    DisplayName = table.Column<string>(type: "character varying(4000)", maxLength: 4000, nullable: false),
                    CreatedAt = table.Column<DateTimeOffset>(type: "timestamp with time zone", nullable: false),
                    UserName = table.Column<string>(type: "character varying(256)", maxLength: 256, nullable: true),
                    NormalizedUserName = table.Column<string>(type: "character varying(256)", maxLength: 256, nullable: true),
                    Email = table.Column<string>(type: "character varying(256)", maxLength: 256, nullable: true),
                    NormalizedEmail = table.Column<string>(type: "character varying(256)", maxLength: 256, nullable: true),
                    EmailConfirmed = table.Column<bool>(type: "boolean", nullable: false),
                    PasswordHash = table.Column<string>(type: "character varying(4000)", maxLength: 4000, nullable: true),
                    SecurityStamp = table.Column<string>(type: "character varying(4000)", maxLength: 4000, nullable: true),
                    ConcurrencyStamp = table.Column<string>(type: "character varying(4000)", maxLength: 4000, nullable: true),
                    PhoneNumber = table.Column<string>(type: "character varying(4000)", maxLength: 4000, nullable: true),
                    PhoneNumberConfirmed = table.Column<bool>(type: "boolean", nullable: false),
                    TwoFactorEnabled = table.Column<bool>(type: "boolean", nullable: false),
                    LockoutEnd = table.Column<DateTimeOffset>(type: "timestamp with time zone", nullable: true),
                    LockoutEnabled = table.Column<bool>(type: "boolean", nullable: false),
                    AccessFailedCount = table.Column<int>(type: "integer", nullable: false)
                },
                constraints: table =>
                {
                    table.PrimaryKey("PK_AspNetUsers", x => x.Id);
                });

            migrationBuilder.CreateTable(
                name: "DataProtectionKeys",
                columns: table => new
                {
                    Id = table.Column<int>(type: "integer", nullable: false)
                        .Annotation("Npgsql:ValueGenerationStrategy", NpgsqlValueGenerationStrategy.IdentityByDefaultColumn),
                    FriendlyName = table.Column<string>(type: "character varying(4000)", maxLength: 4000, nullable: true),
                    Xml = table.Column<string>(type: "character varying(4000)", maxLength: 4000, nullable: true)
                },
                constraints: table =>
                {
                    table.PrimaryKey("PK_DataProtectionKeys", x => x.Id);
                });

            migrationBuilder.CreateTable(
                name: "approvals",
                columns: table => new
                {
                    Id = table.Column<long>(type: "bigint", nullable: false)
                        .Annotation("Npgsql:ValueGenerationStrategy", NpgsqlValueGenerationStrategy.IdentityByDefaultColumn),
                    EvaluationId = table.Column<Guid>(type: "uuid", nullable: false),
                    UserId = table.Column<string>(type: "character varying(4000)", maxLength: 4000, nullable: false),
                    Statement = table.Column<string>(type: "character varying(4000)", maxLength: 4000, nullable: false),
                    ApprovedAt = table.Column<DateTimeOffset>(type: "timestamp with time zone", nullable: false)
                },
                constraints: table =>
                {
                    table.PrimaryKey("PK_approvals", x => x.Id);
                });

            migrationBuilder.CreateTable(
                name: "archived_records",
                columns: table => new
                {
                    Id = table.Column<Guid>(type: "uuid", nullable: false),
                    EvaluationId = table.Column<Guid>(type: "uuid", nullable: false),
                    Kind = table.Column<string>(type: "character varying(20)", maxLength: 20, nullable: false),
                    AlternativeCode = table.Column<string>(type: "character varying(100)", maxLength: 100, nullable: false),
                    FileName = table.Column<string>(type: "character varying(300)", maxLength: 300, nullable: false),
                    Content = table.Column<byte[]>(type: "bytea", maxLength: 50000000, nullable: false),
                    Sha256 = table.Column<string>(type: "character varying(64)", maxLength: 64, nullable: false),
                    SnapshotJson = table.Column<string>(type: "character varying(10000000)", maxLength: 10000000, nullable: false),
                    SnapshotSha256 = table.Column<string>(type: "character varying(64)", maxLength: 64, nullable: false),
                    CertificateThumbprint = table.Column<string>(type: "character varying(128)", maxLength: 128, nullable: false),
                    SelfSigned = table.Column<bool>(type: "boolean", nullable: false),
                    AuditHead = table.Column<string>(type: "character varying(64)", maxLength: 64, nullable: false),
                    CreatedAt = table.Column<DateTimeOffset>(type: "timestamp with time zone", nullable: false),
                    CreatedBy = table.Column<string>(type: "character varying(4000)", maxLength: 4000, nullable: false)
                },
                constraints: table =>
                {
                    table.PrimaryKey("PK_archived_records", x => x.Id);
                });

            migrationBuilder.CreateTable(
                name: "audit_entries",
                columns: table => new
                {
                    Id = table.Column<long>(type: "bigint", nullable: false)
                        .Annotation("Npgsql:ValueGenerationStrategy", NpgsqlValueGenerationStrategy.IdentityByDefaultColumn),
                    Chain = table.Column<string>(type: "character varying(64)", maxLength: 64, nullable: false),
                    Index = table.Column<long>(type: "bigint", nullable: false),
                    At = table.Column<DateTimeOffset>(type: "timestamp with time zone", nullable: false),
                    UserId = table.Column<string>(type: "character varying(4000)", maxLength: 4000, nullable: true),
                    UserName = table.Column<string>(type: "character varying(4000)", maxLength: 4000, nullable: true),
                    Action = table.Column<string>(type: "character varying(100)", maxLength: 100, nullable: false),
                    Target = table.Column<string>(type: "character varying(4000)", maxLength: 4000, nullable: true),
                    OldValue = table.Column<string>(type: "character varying(100000)", maxLength: 100000, nullable: true),
                    NewValue = table.Column<string>(type: "character varying(100000)", maxLength: 100000, nullable: true),
                    PreviousHash = table.Column<string>(type: "character varying(64)", maxLength: 64, nullable: false),
                    Hash = table.Column<string>(type: "character varying(64)", maxLength: 64, nullable: false)
                },
                constraints: table =>
                {
                    table.PrimaryKey("PK_audit_entries", x => x.Id);
                });

            migrationBuilder.CreateTable(
                name: "conflicts",
                columns: table => new
                {
                    Id = table.Column<long>(type: "bigint", nullable: false)
                        .Annotation("Npgsql:ValueGenerationStrategy", NpgsqlValueGenerationStrategy.IdentityByDefaultColumn),
                    EvaluationId = table.Column<Guid>(type: "uuid", nullable: false),
                    UserId = table.Column<string>(type: "character varying(4000)", maxLength: 4000, nullable: false),
                    AlternativeCode = table.Column<string>(type: "character varying(4000)", maxLength: 4000, nullable: false),
                    Statement = table.Column<string>(type: "character varying(4000)", maxLength: 4000, nullable: false),
                    DeclaredAt = table.Column<DateTimeOffset>(type: "timestamp with time zone", nullable: false),
                    Action = table.Column<string>(type: "character varying(4000)", maxLength: 4000, nullable: true)
                },
                constraints: table =>
                {
                    table.PrimaryKey("PK_conflicts", x => x.Id);
                });

            migrationBuilder.CreateTable(
                name: "evaluations",
                columns: table => new
                {
                    Id = table.Column<Guid>(type: "uuid", nullable: false),
                    Reference = table.Column<string>(type: "character varying(100)", maxLength: 100, nullable: false),
                    Title = table.Column<string>(type: "character varying(300)", maxLength: 300, nullable: false),
                    Organisation = table.Column<string>(type: "character varying(4000)", maxLength: 4000, nullable: true),
                    Stage = table.Column<string>(type: "character varying(20)", maxLength: 20, nullable: false),
                    Revision = table.Column<int>(type: "integer", nullable: false),
                    PreviousRevisionId = table.Column<Guid>(type: "uuid", nullable: true),
                    RevisionReason = table.Column<string>(type: "character varying(4000)", maxLength: 4000, nullable: true),
                    SupersededById = table.Column<Guid>(type: "uuid", nullable: true),
                    PlanJson = table.Column<string>(type: "character varying(1000000)", maxLength: 1000000, nullable: false),
                    PlanHash = table.Column<string>(type: "character varying(4000)", maxLength: 4000, nullable: true),
                    MinRationaleLength = table.Column<int>(type: "integer", nullable: false),
                    PricesVisibleToAssessors = table.Column<bool>(type: "boolean", nullable: false),
                    RequiredApprovals = table.Column<int>(type: "integer", nullable: false),
                    CreatedAt = table.Column<DateTimeOffset>(type: "timestamp with time zone", nullable: false),
                    CreatedBy = table.Column<string>(type: "character varying(4000)", maxLength: 4000, nullable: false),
                    PlanLockedAt = table.Column<DateTimeOffset>(type: "timestamp with time zone", nullable: true),
                    ScoringOpenedAt = table.Column<DateTimeOffset>(type: "timestamp with time zone", nullable: true),
                    ModerationStartedAt = table.Column<DateTimeOffset>(type: "timestamp with time zone", nullable: true),
                    SignedOffAt = table.Column<DateTimeOffset>(type: "timestamp with time zone", nullable: true),
                    SignOffRequestedAt = table.Column<DateTimeOffset>(type: "timestamp with time zone", nullable: true),
                    SignOffRequestedBy = table.Column<string>(type: "character varying(4000)", maxLength: 4000, nullable: true),
                    SignOffRequestNote = table.Column<string>(type: "character varying(4000)", maxLength: 4000, nullable: true),
                    LegalHold = table.Column<bool>(type: "boolean", nullable: false),
                    LegalHoldReason = table.Column<string>(type: "character varying(4000)", maxLength: 4000, nullable: true),
                    RetainUntil = table.Column<DateTimeOffset>(type: "timestamp with time zone", nullable: true),
                    Version = table.Column<long>(type: "bigint", nullable: false)
                },
                constraints: table =>
                {
                    table.PrimaryKey("PK_evaluations", x => x.Id);
                });

            migrationBuilder.CreateTable(
                name: "gate_results",
                columns: table => new
                {
                    Id = table.Column<long>(type: "bigint", nullable: false)
                        .Annotation("Npgsql:ValueGenerationStrategy", NpgsqlValueGenerationStrategy.IdentityByDefaultColumn),
                    EvaluationId = table.Column<Guid>(type: "uuid", nullable: false),
                    AlternativeCode = table.Column<string>(type: "character varying(4000)", maxLength: 4000, nullable: false),
                    CriterionId = table.Column<string>(type: "character varying(4000)", maxLength: 4000, nullable: false),
                    Passed = table.Column<bool>(type: "boolean", nullable: false),
                    Note = table.Column<string>(type: "character varying(4000)", maxLength: 4000, nullable: true),
                    EnteredBy = table.Column<string>(type: "character varying(4000)", maxLength: 4000, nullable: false),
                    UpdatedAt = table.Column<DateTimeOffset>(type: "timestamp with time zone", nullable: false),
                    Version = table.Column<long>(type: "bigint", nullable: false)
                },
                constraints: table =>
                {
                    table.PrimaryKey("PK_gate_results", x => x.Id);
                });

            migrationBuilder.CreateTable(
                name: "moderation",
                columns: table => new
                {
                    Id = table.Column<long>(type: "bigint", nullable: false)
                        .Annotation("Npgsql:ValueGenerationStrategy", NpgsqlValueGenerationStrategy.IdentityByDefaultColumn),
                    EvaluationId = table.Column<Guid>(type: "uuid", nullable: false),
                    AlternativeCode = table.Column<string>(type: "character varying(4000)", maxLength: 4000, nullable: false),
                    CriterionId = table.Column<string>(type: "character varying(4000)", maxLength: 4000, nullable: false),
                    Term = table.Column<string>(type: "character varying(4000)", maxLength: 4000, nullable: false),
                    Reason = table.Column<string>(type: "character varying(4000)", maxLength: 4000, nullable: false),
                    AgreedByJson = table.Column<string>(type: "character varying(4000)", maxLength: 4000, nullable: false),
                    OriginalsJson = table.Column<string>(type: "character varying(100000)", maxLength: 100000, nullable: false),
                    RecordedBy = table.Column<string>(type: "character varying(4000)", maxLength: 4000, nullable: false),
                    RecordedAt = table.Column<DateTimeOffset>(type: "timestamp with time zone", nullable: false)
                },
                constraints: table =>
                {
                    table.PrimaryKey("PK_moderation", x => x.Id);
                });

            migrationBuilder.CreateTable(
                name: "numeric_values",
                columns: table => new
                {
                    Id = table.Column<long>(type: "bigint", nullable: false)
                        .Annotation("Npgsql:ValueGenerationStrategy", NpgsqlValueGenerationStrategy.IdentityByDefaultColumn),
                    EvaluationId = table.Column<Guid>(type: "uuid", nullable: false),
                    AlternativeCode = table.Column<string>(type: "character varying(4000)", maxLength: 4000, nullable: false),
                    CriterionId = table.Column<string>(type: "character varying(4000)", maxLength: 4000, nullable: false),
                    Value = table.Column<double>(type: "double precision", nullable: false),
                    EnteredBy = table.Column<string>(type: "character varying(4000)", maxLength: 4000, nullable: false),
                    UpdatedAt = table.Column<DateTimeOffset>(type: "timestamp with time zone", nullable: false),
                    Version = table.Column<long>(type: "bigint", nullable: false)
                },
                constraints: table =>
                {
                    table.PrimaryKey("PK_numeric_values", x => x.Id);
                });

            migrationBuilder.CreateTable(
                name: "ratings",
                columns: table => new
                {
                    Id = table.Column<long>(type: "bigint", nullable: false)
                        .Annotation("Npgsql:ValueGenerationStrategy", NpgsqlValueGenerationStrategy.IdentityByDefaultColumn),
                    EvaluationId = table.Column<Guid>(type: "uuid", nullable: false),
                    AssessorCode = table.Column<string>(type: "character varying(4000)", maxLength: 4000, nullable: false),
                    AlternativeCode = table.Column<string>(type: "character varying(4000)", maxLength: 4000, nullable: false),
                    CriterionId = table.Column<string>(type: "character varying(4000)", maxLength: 4000, nullable: false),
                    Term = table.Column<string>(type: "character varying(4000)", maxLength: 4000, nullable: true),
                    Rationale = table.Column<string>(type: "character varying(4000)", maxLength: 4000, nullable: true),
                    DeclinedReason = table.Column<string>(type: "character varying(4000)", maxLength: 4000, nullable: true),
                    UpdatedAt = table.Column<DateTimeOffset>(type: "timestamp with time zone", nullable: false),
                    Version = table.Column<long>(type: "bigint", nullable: false)
                },
                constraints: table =>
                {
                    table.PrimaryKey("PK_ratings", x => x.Id);
                });

            migrationBuilder.CreateTable(
                name: "weight_judgements",
                columns: table => new
                {
                    Id = table.Column<long>(type: "bigint", nullable: false)
                        .Annotation("Npgsql:ValueGenerationStrategy", NpgsqlValueGenerationStrategy.IdentityByDefaultColumn),
                    EvaluationId = table.Column<Guid>(type: "uuid", nullable: false),
                    AssessorCode = table.Column<string>(type: "character varying(4000)", maxLength: 4000, nullable: false),
                    Kind = table.Column<string>(type: "character varying(4000)", maxLength: 4000, nullable: false),
                    Node = table.Column<string>(type: "character varying(4000)", maxLength: 4000, nullable: false),
                    Column = table.Column<string>(type: "character varying(4000)", maxLength: 4000, nullable: true),
                    Term = table.Column<string>(type: "character varying(4000)", maxLength: 4000, nullable: true),
                    Lower = table.Column<double>(type: "double precision", nullable: true),
                    Middle = table.Column<double>(type: "double precision", nullable: true),
                    Upper = table.Column<double>(type: "double precision", nullable: true),
                    UpdatedAt = table.Column<DateTimeOffset>(type: "timestamp with time zone", nullable: false),
                    Version = table.Column<long>(type: "bigint", nullable: false)
                },
                constraints: table =>
                {
                    table.PrimaryKey("PK_weight_judgements", x => x.Id);
                });

            migrationBuilder.CreateTable(
                name: "AspNetRoleClaims",
                columns: table => new
                {
                    Id = table.Column<int>(type: "integer", nullable: false)
                        .Annotation("Npgsql:ValueGenerationStrategy", NpgsqlValueGenerationStrategy.IdentityByDefaultColumn),
                    RoleId = table.Column<string>(type: "character varying(4000)", maxLength: 4000, nullable: false),
                    ClaimType = table.Column<string>(type: "character varying(4000)", maxLength: 4000, nullable: true),
                    ClaimValue = table.Column<string>(type: "character varying(4000)", maxLength: 4000, nullable: true)
                },
                constraints: table =>
                {
                    table.PrimaryKey("PK_AspNetRoleClaims", x => x.Id);
                    table.ForeignKey(
                        name: "FK_AspNetRoleClaims_AspNetRoles_RoleId",
                        column: x => x.RoleId,
                        principalTable: "AspNetRoles",
                        principalColumn: "Id",
                        onDelete: ReferentialAction.Cascade);
                });

            migrationBuilder.CreateTable(
                name: "AspNetUserClaims",
                columns: table => new
                {
                    Id = table.Column<int>(type: "integer", nullable: false)
                        .Annotation("Npgsql:ValueGenerationStrategy", NpgsqlValueGenerationStrategy.IdentityByDefaultColumn),
                    UserId = table.Column<string>(type: "character varying(4000)", maxLength: 4000, nullable: false),
                    ClaimType = table.Column<string>(type: "character varying(4000)", maxLength: 4000, nullable: true),
                    ClaimValue = table.Column<string>(type: "character varying(4000)", maxLength: 4000, nullable: true)
                },
                constraints: table =>
                {
                    table.PrimaryKey("PK_AspNetUserClaims", x => x.Id);
                    table.ForeignKey(
                        name: "FK_AspNetUserClaims_AspNetUsers_UserId",
                        column: x => x.UserId,
                        principalTable: "AspNetUsers",
                        principalColumn: "Id",
                        onDelete: ReferentialAction.Cascade);
                });

            migrationBuilder.CreateTable(
                name: "AspNetUserLogins",
                columns: table => new
                {
                    LoginProvider = table.Column<string>(type: "character varying(4000)", maxLength: 4000, nullable: false),
                    ProviderKey = table.Column<string>(type: "character varying(4000)", maxLength: 4000, nullable: false),
                    ProviderDisplayName = table.Column<string>(type: "character varying(4000)", maxLength: 4000, nullable: true),
                    UserId = table.Column<string>(type: "character varying(4000)", maxLength: 4000, nullable: false)
                },
                constraints: table =>
                {
                    table.PrimaryKey("PK_AspNetUserLogins", x => new { x.LoginProvider, x.ProviderKey });
                    table.ForeignKey(
                        name: "FK_AspNetUserLogins_AspNetUsers_UserId",
                        column: x => x.UserId,
                        principalTable: "AspNetUsers",
                        principalColumn: "Id",
                        onDelete: ReferentialAction.Cascade);
                });

            migrationBuilder.CreateTable(
                name: "AspNetUserRoles",
                columns: table => new
                {
                    UserId = table.Column<string>(type: "character varying(4000)", maxLength: 4000, nullable: false),
                    RoleId = table.Column<string>(type: "character varying(4000)", maxLength: 4000, nullable: false)
                },
                constraints: table =>
                {
                    table.PrimaryKey("PK_AspNetUserRoles", x => new { x.UserId, x.RoleId });
                    table.ForeignKey(
                        name: "FK_AspNetUserRoles_AspNetRoles_RoleId",
                        column: x => x.RoleId,
                        principalTable: "AspNetRoles",
                        principalColumn: "Id",
                        onDelete: ReferentialAction.Cascade);
                    table.ForeignKey(
                        name: "FK_AspNetUserRoles_AspNetUsers_UserId",
                        column: x => x.UserId,
                        principalTable: "AspNetUsers",
                        principalColumn: "Id",
                        onDelete: ReferentialAction.Cascade);
                });

            migrationBuilder.CreateTable(
                name: "AspNetUserTokens",
                columns: table => new
                {
                    UserId = table.Column<string>(type: "character varying(4000)", maxLength: 4000, nullable: false),
                    LoginProvider = table.Column<string>(type: "character varying(4000)", maxLength: 4000, nullable: false),
                    Name = table.Column<string>(type: "character varying(4000)", maxLength: 4000, nullable: false),
                    Value = table.Column<string>(type: "character varying(4000)", maxLength: 4000, nullable: true)
                },
                constraints: table =>
                {
                    table.PrimaryKey("PK_AspNetUserTokens", x => new { x.UserId, x.LoginProvider, x.Name });
                    table.ForeignKey(
                        name: "FK_AspNetUserTokens_AspNetUsers_UserId",
                        column: x => x.UserId,
                        principalTable: "AspNetUsers",
                        principalColumn: "Id",
                        onDelete: ReferentialAction.Cascade);
                });

            migrationBuilder.CreateTable(
                name: "alternatives",
                columns: table => new
                {
                    Id = table.Column<long>(type: "bigint", nullable: false)
                        .Annotation("Npgsql:ValueGenerationStrategy", NpgsqlValueGenerationStrategy.IdentityByDefaultColumn),
                    EvaluationId = table.Column<Guid>(type: "uuid", nullable: false),
                    Code = table.Column<string>(type: "character varying(4000)", maxLength: 4000, nullable: false),
                    Name = table.Column<string>(type: "character varying(4000)", maxLength: 4000, nullable: false),
                    Position = table.Column<int>(type: "integer", nullable: false),
                    AddedAt = table.Column<DateTimeOffset>(type: "timestamp with time zone", nullable: false)
                },
                constraints: table =>
                {
                    table.PrimaryKey("PK_alternatives", x => x.Id);
                    table.ForeignKey(
                        name: "FK_alternatives_evaluations_EvaluationId",
                        column: x => x.EvaluationId,
                        principalTable: "evaluations",
                        principalColumn: "Id",
                        onDelete: ReferentialAction.Cascade);
                });

            migrationBuilder.CreateTable(
                name: "panel_members",
                columns: table => new
                {
                    Id = table.Column<long>(type: "bigint", nullable: false)
                        .Annotation("Npgsql:ValueGenerationStrategy", NpgsqlValueGenerationStrategy.IdentityByDefaultColumn),
                    EvaluationId = table.Column<Guid>(type: "uuid", nullable: false),
                    UserId = table.Column<string>(type: "character varying(4000)", maxLength: 4000, nullable: false),
                    Role = table.Column<string>(type: "character varying(20)", maxLength: 20, nullable: false),
                    AssessorCode = table.Column<string>(type: "character varying(4000)", maxLength: 4000, nullable: true),
                    Weight = table.Column<double>(type: "double precision", nullable: false),
                    AssignedCriteriaJson = table.Column<string>(type: "character varying(4000)", maxLength: 4000, nullable: true),
                    DeclarationSignedAt = table.Column<DateTimeOffset>(type: "timestamp with time zone", nullable: true),
                    DeclarationVersion = table.Column<string>(type: "character varying(4000)", maxLength: 4000, nullable: true),
                    NamesConfirmedAt = table.Column<DateTimeOffset>(type: "timestamp with time zone", nullable: true),
                    WeightsSubmittedAt = table.Column<DateTimeOffset>(type: "timestamp with time zone", nullable: true),
                    SubmittedAt = table.Column<DateTimeOffset>(type: "timestamp with time zone", nullable: true),
                    Version = table.Column<long>(type: "bigint", nullable: false)
                },
                constraints: table =>
                {
                    table.PrimaryKey("PK_panel_members", x => x.Id);
                    table.ForeignKey(
                        name: "FK_panel_members_AspNetUsers_UserId",
                        column: x => x.UserId,
                        principalTable: "AspNetUsers",
                        principalColumn: "Id",
                        onDelete: ReferentialAction.Cascade);
                    table.ForeignKey(
                        name: "FK_panel_members_evaluations_EvaluationId",
                        column: x => x.EvaluationId,
                        principalTable: "evaluations",
                        principalColumn: "Id",
                        onDelete: ReferentialAction.Cascade);
                });

            migrationBuilder.CreateIndex(
                name: "IX_AspNetRoleClaims_RoleId",
                table: "AspNetRoleClaims",
                column: "RoleId");

            migrationBuilder.CreateIndex(
                name: "RoleNameIndex",
                table: "AspNetRoles",
                column: "NormalizedName",
                unique: true);

            migrationBuilder.CreateIndex(
                name: "IX_AspNetUserClaims_UserId",
                table: "AspNetUserClaims",
                column: "UserId");

            migrationBuilder.CreateIndex(
                name: "IX_AspNetUserLogins_UserId",
                table: "AspNetUserLogins",
                column: "UserId");

            migrationBuilder.CreateIndex(
                name: "IX_AspNetUserRoles_RoleId",
                table: "AspNetUserRoles",
                column: "RoleId");

            migrationBuilder.CreateIndex(
                name: "EmailIndex",
                table: "AspNetUsers",
                column: "NormalizedEmail");

            migrationBuilder.CreateIndex(
                name: "UserNameIndex",
                table: "AspNetUsers",
                column: "NormalizedUserName",
                unique: true);

            migrationBuilder.CreateIndex(
                name: "IX_alternatives_EvaluationId_Code",
                table: "alternatives",
                columns: new[] { "EvaluationId", "Code" },
                unique: true);

            migrationBuilder.CreateIndex(
                name: "IX_approvals_EvaluationId_UserId",
                table: "approvals",
                columns: new[] { "EvaluationId", "UserId" },
                unique: true);

            migrationBuilder.CreateIndex(
                name: "IX_archived_records_EvaluationId_Kind_AlternativeCode",
                table: "archived_records",
                columns: new[] { "EvaluationId", "Kind", "AlternativeCode" },
                unique: true);

            migrationBuilder.CreateIndex(
                name: "IX_archived_records_Sha256",
                table: "archived_records",
                column: "Sha256");

            migrationBuilder.CreateIndex(
                name: "IX_audit_entries_Chain_Index",
                table: "audit_entries",
                columns: new[] { "Chain", "Index" },
                unique: true);

            migrationBuilder.CreateIndex(
                name: "IX_conflicts_EvaluationId_UserId_AlternativeCode",
                table: "conflicts",
                columns: new[] { "EvaluationId", "UserId", "AlternativeCode" },
                unique: true);

            migrationBuilder.CreateIndex(
                name: "IX_evaluations_Reference",
                table: "evaluations",
                column: "Reference");

            migrationBuilder.CreateIndex(
                name: "IX_gate_results_EvaluationId_AlternativeCode_CriterionId",
                table: "gate_results",
                columns: new[] { "EvaluationId", "AlternativeCode", "CriterionId" },
                unique: true);

            migrationBuilder.CreateIndex(
                name: "IX_moderation_EvaluationId_AlternativeCode_CriterionId",
                table: "moderation",
                columns: new[] { "EvaluationId", "AlternativeCode", "CriterionId" });

            migrationBuilder.CreateIndex(
                name: "IX_numeric_values_EvaluationId_AlternativeCode_CriterionId",
                table: "numeric_values",
                columns: new[] { "EvaluationId", "AlternativeCode", "CriterionId" },
                unique: true);

            migrationBuilder.CreateIndex(
                name: "IX_panel_members_EvaluationId_AssessorCode",
                table: "panel_members",
                columns: new[] { "EvaluationId", "AssessorCode" });

            migrationBuilder.CreateIndex(
                name: "IX_panel_members_EvaluationId_UserId_Role",
                table: "panel_members",
                columns: new[] { "EvaluationId", "UserId", "Role" },
                unique: true);

            migrationBuilder.CreateIndex(
                name: "IX_panel_members_UserId",
                table: "panel_members",
                column: "UserId");

            migrationBuilder.CreateIndex(
                name: "IX_ratings_EvaluationId_AssessorCode_AlternativeCode_Criterion~",
                table: "ratings",
                columns: new[] { "EvaluationId", "AssessorCode", "AlternativeCode", "CriterionId" },
                unique: true);

            migrationBuilder.CreateIndex(
                name: "IX_weight_judgements_EvaluationId_AssessorCode_Kind_Node_Column",
                table: "weight_judgements",
                columns: new[] { "EvaluationId", "AssessorCode", "Kind", "Node", "Column" },
                unique: true);
        }

        /// <inheritdoc />
        protected override void Down(MigrationBuilder migrationBuilder)
        {
            migrationBuilder.DropTable(
                name: "AspNetRoleClaims");

            migrationBuilder.DropTable(
                name: "AspNetUserClaims");

            migrationBuilder.DropTable(
                name: "AspNetUserLogins");

            migrationBuilder.DropTable(
                name: "AspNetUserRoles");

            migrationBuilder.DropTable(
                name: "AspNetUserTokens");

            migrationBuilder.DropTable(
                name: "DataProtectionKeys");

            migrationBuilder.DropTable(
                name: "alternatives");

            migrationBuilder.DropTable(
                name: "approvals");

            migrationBuilder.DropTable(
                name: "archived_records");

            migrationBuilder.DropTable(
                name: "audit_entries");

            migrationBuilder.DropTable(
                name: "conflicts");

            migrationBuilder.DropTable(
                name: "gate_results");

            migrationBuilder.DropTable(
                name: "moderation");

            migrationBuilder.DropTable(
                name: "numeric_values");

            migrationBuilder.DropTable(
                name: "panel_members");

            migrationBuilder.DropTable(
                name: "ratings");

            migrationBuilder.DropTable(
                name: "weight_judgements");

            migrationBuilder.DropTable(
                name: "AspNetRoles");

            migrationBuilder.DropTable(
                name: "AspNetUsers");

            migrationBuilder.DropTable(
                name: "evaluations");
        }
    }
}
