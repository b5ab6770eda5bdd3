using System;
using Microsoft.EntityFrameworkCore.Migrations;

#nullable disable

namespace Decide.Data.Sqlite.Migrations
{
    /// <inheritdoc />
    public partial class SignOffAndArchive : Migration
    {
        /// <inheritdoc />
        protected override void Up(MigrationBuilder migrationBuilder)
        {
            migrationBuilder.AddColumn<string>(
                name: "SignOffRequestNote",
                table: "evaluations",
                type: "TEXT",
                maxLength: 4000,
                nullable: true);

            migrationBuilder.AddColumn<DateTimeOffset>(
                name: "SignOffRequestedAt",
                table: "evaluations",
                type: "TEXT",
                nullable: true);

            migrationBuilder.AddColumn<string>(
                name: "SignOffRequestedBy",
                table: "evaluations",
                type: "TEXT",
                maxLength: 4000,
                nullable: true);

            migrationBuilder.CreateTable(
                name: "DataProtectionKeys",
                columns: table => new
                {
                    Id = table.Column<int>(type: "INTEGER", nullable: false)
                        .Annotation("Sqlite:Autoincrement", true),
                    FriendlyName = table.Column<string>(type: "TEXT", maxLength: 4000, nullable: true),
                    Xml = table.Column<string>(type: "TEXT", maxLength: 4000, nullable: true)
                },
                constraints: table =>
                {
                    table.PrimaryKey("PK_DataProtectionKeys", x => x.Id);
                });

            migrationBuilder.CreateTable(
                name: "archived_records",
                columns: table => new
                {
                    Id = table.Column<Guid>(type: "TEXT", nullable: false),
                    EvaluationId = table.Column<Guid>(type: "TEXT", nullable: false),
                    Kind = table.Column<string>(type: "TEXT", maxLength: 20, nullable: false),
                    AlternativeCode = table.Column<string>(type: "TEXT", maxLength: 100, nullable: false),
                    FileName = table.Column<string>(type: "TEXT", maxLength: 300, nullable: false),
                    Content = table.Column<byte[]>(type: "BLOB", maxLength: 50000000, nullable: false),
                    Sha256 = table.Column<string>(type: "TEXT", maxLength: 64, nullable: false),
                    SnapshotJson = table.Column<string>(type: "TEXT", maxLength: 10000000, nullable: false),
                    SnapshotSha256 = table.Column<string>(type: "TEXT", maxLength: 64, nullable: false),
                    CertificateThumbprint = table.Column<string>(type: "TEXT", maxLength: 128, nullable: false),
                    SelfSigned = table.Column<bool>(type: "INTEGER", nullable: false),
                    AuditHead = table.Column<string>(type: "TEXT", maxLength: 64, nullable: false),
                    CreatedAt = table.Column<DateTimeOffset>(type: "TEXT", nullable: false),
                    CreatedBy = table.Column<string>(type: "TEXT", maxLength: 4000, nullable: false)
                },
                constraints: table =>
                {
                    table.PrimaryKey("PK_archived_records", x => x.Id);
                });

            migrationBuilder.CreateIndex(
                name: "IX_archived_records_EvaluationId_Kind_AlternativeCode",
                table: "archived_records",
                columns: new[] { "EvaluationId", "Kind", "AlternativeCode" },
                unique: true);

            migrationBuilder.CreateIndex(
                name: "IX_archived_records_Sha256",
                table: "archived_records",
                column: "Sha256");
        }

        /// <inheritdoc />
        protected override void Down(MigrationBuilder migrationBuilder)
        {
            migrationBuilder.DropTable(
                name: "DataProtectionKeys");

            migrationBuilder.DropTable(
                name: "archived_records");

            migrationBuilder.DropColumn(
                name: "SignOffRequestNote",
                table: "evaluations");

            migrationBuilder.DropColumn(
                name: "SignOffRequestedAt",
                table: "evaluations");

            migrationBuilder.DropColumn(
                name: "SignOffRequestedBy",
                table: "evaluations");
        }
    }
}
