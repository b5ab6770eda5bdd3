using System;
using Microsoft.EntityFrameworkCore.Migrations;
using Npgsql.EntityFrameworkCore.PostgreSQL.Metadata;

#nullable disable

namespace Decide.Data.Postgres.Migrations
{
    /// <inheritdoc />
    public partial class ReviewAssignmentsAndRounds : Migration
    {
        /// <inheritdoc />
        protected override void Up(MigrationBuilder migrationBuilder)
        {
            migrationBuilder.AddColumn<string>(
                name: "TopicsJson",
                table: "panel_members",
                type: "character varying(4000)",
                maxLength: 4000,
                nullable: true);

            migrationBuilder.AddColumn<bool>(
                name: "IsRound",
                table: "evaluations",
                type: "boolean",
                nullable: false,
                defaultValue: false);

            migrationBuilder.AddColumn<double>(
                name: "RequestedAmount",
                table: "alternatives",
                type: "double precision",
                nullable: true);

            migrationBuilder.AddColumn<string>(
                name: "Topic",
                table: "alternatives",
                type: "character varying(200)",
                maxLength: 200,
                nullable: true);

            migrationBuilder.CreateTable(
                name: "review_assignments",
                columns: table => new
                {
                    Id = table.Column<long>(type: "bigint", nullable: false)
                        .Annotation("Npgsql:ValueGenerationStrategy", NpgsqlValueGenerationStrategy.IdentityByDefaultColumn),
                    EvaluationId = table.Column<Guid>(type: "uuid", nullable: false),
                    AssessorCode = table.Column<string>(type: "character varying(4000)", maxLength: 4000, nullable: false),
                    AlternativeCode = table.Column<string>(type: "character varying(4000)", maxLength: 4000, nullable: false),
                    Source = table.Column<string>(type: "character varying(16)", maxLength: 16, nullable: false),
                    AssignedBy = table.Column<string>(type: "character varying(4000)", maxLength: 4000, nullable: false),
                    AssignedAt = table.Column<DateTimeOffset>(type: "timestamp with time zone", nullable: false)
                },
                constraints: table =>
                {
                    table.PrimaryKey("PK_review_assignments", x => x.Id);
                });

            migrationBuilder.CreateIndex(
                name: "IX_review_assignments_EvaluationId_AlternativeCode",
                table: "review_assignments",
                columns: new[] { "EvaluationId", "AlternativeCode" });

            migrationBuilder.CreateIndex(
                name: "IX_review_assignments_EvaluationId_AssessorCode_AlternativeCode",
                table: "review_assignments",
                columns: new[] { "EvaluationId", "AssessorCode", "AlternativeCode" },
                unique: true);
        }

        /// <inheritdoc />
        protected override void Down(MigrationBuilder migrationBuilder)
        {
            migrationBuilder.DropTable(
                name: "review_assignments");

            migrationBuilder.DropColumn(
                name: "TopicsJson",
                table: "panel_members");

            migrationBuilder.DropColumn(
                name: "IsRound",
                table: "evaluations");

            migrationBuilder.DropColumn(
                name: "RequestedAmount",
                table: "alternatives");

            migrationBuilder.DropColumn(
                name: "Topic",
                table: "alternatives");
        }
    }
}
