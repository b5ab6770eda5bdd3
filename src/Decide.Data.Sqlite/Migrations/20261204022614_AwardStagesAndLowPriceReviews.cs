using System;
using Microsoft.EntityFrameworkCore.Migrations;

#nullable disable

namespace Decide.Data.Sqlite.Migrations
{
    /// <inheritdoc />
    public partial class AwardStagesAndLowPriceReviews : Migration
    {
        /// <inheritdoc />
        protected override void Up(MigrationBuilder migrationBuilder)
        {
            migrationBuilder.AddColumn<string>(
                name: "MethodologyHash",
                table: "evaluations",
                type: "TEXT",
                maxLength: 4000,
                nullable: true);

            migrationBuilder.AddColumn<bool>(
                name: "PointsAward",
                table: "evaluations",
                type: "INTEGER",
                nullable: false,
                defaultValue: false);

            migrationBuilder.AddColumn<DateTimeOffset>(
                name: "PricesOpenedAt",
                table: "evaluations",
                type: "TEXT",
                nullable: true);

            migrationBuilder.AddColumn<string>(
                name: "PricesOpenedBy",
                table: "evaluations",
                type: "TEXT",
                maxLength: 4000,
                nullable: true);

            migrationBuilder.AddColumn<bool>(
                name: "TwoStage",
                table: "evaluations",
                type: "INTEGER",
                nullable: false,
                defaultValue: false);

            migrationBuilder.CreateTable(
                name: "low_price_reviews",
                columns: table => new
                {
                    Id = table.Column<long>(type: "INTEGER", nullable: false)
                        .Annotation("Sqlite:Autoincrement", true),
                    EvaluationId = table.Column<Guid>(type: "TEXT", nullable: false),
                    AlternativeCode = table.Column<string>(type: "TEXT", maxLength: 4000, nullable: false),
                    Asked = table.Column<string>(type: "TEXT", maxLength: 8000, nullable: false),
                    AskedBy = table.Column<string>(type: "TEXT", maxLength: 4000, nullable: false),
                    AskedAt = table.Column<DateTimeOffset>(type: "TEXT", nullable: false),
                    Answer = table.Column<string>(type: "TEXT", maxLength: 20000, nullable: true),
                    AnsweredAt = table.Column<DateTimeOffset>(type: "TEXT", nullable: true),
                    Decision = table.Column<string>(type: "TEXT", maxLength: 16, nullable: true),
                    Reasons = table.Column<string>(type: "TEXT", maxLength: 8000, nullable: true),
                    DecidedBy = table.Column<string>(type: "TEXT", maxLength: 4000, nullable: true),
                    DecidedAt = table.Column<DateTimeOffset>(type: "TEXT", nullable: true),
                    Version = table.Column<long>(type: "INTEGER", nullable: false)
                },
                constraints: table =>
                {
                    table.PrimaryKey("PK_low_price_reviews", x => x.Id);
                });

            migrationBuilder.CreateIndex(
                name: "IX_low_price_reviews_EvaluationId_AlternativeCode",
                table: "low_price_reviews",
                columns: new[] { "EvaluationId", "AlternativeCode" },
                unique: true);
        }

        /// <inheritdoc />
        protected override void Down(MigrationBuilder migrationBuilder)
        {
            migrationBuilder.DropTable(
                name: "low_price_reviews");

            migrationBuilder.DropColumn(
                name: "MethodologyHash",
                table: "evaluations");

            migrationBuilder.DropColumn(
                name: "PointsAward",
                table: "evaluations");

            migrationBuilder.DropColumn(
                name: "PricesOpenedAt",
                table: "evaluations");

            migrationBuilder.DropColumn(
                name: "PricesOpenedBy",
                table: "evaluations");

            migrationBuilder.DropColumn(
                name: "TwoStage",
                table: "evaluations");
        }
    }
}
