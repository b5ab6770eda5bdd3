using System;
using Microsoft.EntityFrameworkCore.Migrations;
using Npgsql.EntityFrameworkCore.PostgreSQL.Metadata;

#nullable disable

namespace Decide.Data.Postgres.Migrations
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
                type: "character varying(4000)",
                maxLength: 4000,
                nullable: true);

            migrationBuilder.AddColumn<bool>(
                name: "PointsAward",
                table: "evaluations",
                type: "boolean",
                nullable: false,
                defaultValue: false);

            migrationBuilder.AddColumn<DateTimeOffset>(
                name: "PricesOpenedAt",
                table: "evaluations",
                type: "timestamp with time zone",
                nullable: true);

            migrationBuilder.AddColumn<string>(
                name: "PricesOpenedBy",
                table: "evaluations",
                type: "character varying(4000)",
                maxLength: 4000,
                nullable: true);

            migrationBuilder.AddColumn<bool>(
                name: "TwoStage",
                table: "evaluations",
                type: "boolean",
                nullable: false,
                defaultValue: false);

            migrationBuilder.CreateTable(
                name: "low_price_reviews",
                columns: table => new
                {
                    Id = table.Column<long>(type: "bigint", nullable: false)
                        .Annotation("Npgsql:ValueGenerationStrategy", NpgsqlValueGenerationStrategy.IdentityByDefaultColumn),
                    EvaluationId = table.Column<Guid>(type: "uuid", nullable: false),
                    AlternativeCode = table.Column<string>(type: "character varying(4000)", maxLength: 4000, nullable: false),
                    Asked = table.Column<string>(type: "character varying(8000)", maxLength: 8000, nullable: false),
                    AskedBy = table.Column<string>(type: "character varying(4000)", maxLength: 4000, nullable: false),
                    AskedAt = table.Column<DateTimeOffset>(type: "timestamp with time zone", nullable: false),
                    Answer = table.Column<string>(type: "character varying(20000)", maxLength: 20000, nullable: true),
                    AnsweredAt = table.Column<DateTimeOffset>(type: "timestamp with time zone", nullable: true),
                    Decision = table.Column<string>(type: "character varying(16)", maxLength: 16, nullable: true),
                    Reasons = table.Column<string>(type: "character varying(8000)", maxLength: 8000, nullable: true),
                    DecidedBy = table.Column<string>(type: "character varying(4000)", maxLength: 4000, nullable: true),
                    DecidedAt = table.Column<DateTimeOffset>(type: "timestamp with time zone", nullable: true),
                    Version = table.Column<long>(type: "bigint", nullable: false)
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
