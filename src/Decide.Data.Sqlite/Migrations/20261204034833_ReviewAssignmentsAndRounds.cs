using System;
using Microsoft.EntityFrameworkCore.Migrations;

#nullable disable

namespace Decide.Data.Sqlite.Migrations
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
                type: "TEXT",
                maxLength: 4000,
                nullable: true);

            migrationBuilder.AddColumn<bool>(
                name: "IsRound",
                table: "evaluations",
                type: "INTEGER",
                nullable: false,
                defaultValue: false);

            migrationBuilder.AddColumn<double>(
                name: "RequestedAmount",
                table: "alternatives",
                type: "REAL",
                nullable: true);

            migrationBuilder.AddColumn<string>(
                name: "Topic",
                table: "alternatives",
                type: "TEXT",
                maxLength: 200,
                nullable: true);

            migrationBuilder.CreateTable(
                name: "review_assignments",
                columns: table => new
                {
                    Id = table.Column<long>(type: "INTEGER", nullable: false)
                        .Annotation("Sqlite:Autoincrement", true),
                    EvaluationId = table.Column<Guid>(type: "TEXT", nullable: false),
                    AssessorCode = table.Column<string>(type: "TEXT", maxLength: 4000, nullable: false),
                    AlternativeCode = table.Column<string>(type: "TEXT", maxLength: 4000, nullable: false),
                    Source = table.Column<string>(type: "TEXT", maxLength: 16, nullable: false),
                    AssignedBy = table.Column<string>(type: "TEXT", maxLength: 4000, nullable: false),
                    AssignedAt = table.Column<DateTimeOffset>(type: "TEXT", nullable: false)
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
