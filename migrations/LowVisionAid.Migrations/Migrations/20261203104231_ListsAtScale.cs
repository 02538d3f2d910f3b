using System;
using Microsoft.EntityFrameworkCore.Migrations;

#nullable disable

namespace LowVisionAid.Migrations.Migrations
{
    /// <inheritdoc />
    public partial class ListsAtScale : Migration
    {
        /// <inheritdoc />
        protected override void Up(MigrationBuilder migrationBuilder)
        {
            migrationBuilder.AddColumn<DateOnly>(
                name: "LastVisitDate",
                table: "Clients",
                type: "TEXT",
                nullable: true);

            migrationBuilder.AddColumn<string>(
                name: "SearchText",
                table: "Clients",
                type: "TEXT",
                maxLength: 241,
                nullable: false,
                defaultValue: "");

            migrationBuilder.CreateIndex(
                name: "IX_Trials_OpenFollowUps",
                table: "Trials",
                columns: new[] { "FollowUpDue", "Id" },
                filter: "\"FollowUpDue\" IS NOT NULL AND \"FollowUpDone\" IS NULL");

            migrationBuilder.CreateIndex(
                name: "IX_Clients_LastVisitDate_Code",
                table: "Clients",
                columns: new[] { "LastVisitDate", "Code" },
                descending: new[] { true, false });

            // The latest visit of every client already recorded; the search text is filled by ClientSearch.FillMissingAsync.
            migrationBuilder.Sql("UPDATE Clients SET LastVisitDate = (SELECT MAX(v.VisitDate) FROM Visits AS v WHERE v.ClientId = Clients.Id);");
        }

        /// <inheritdoc />
        protected override void Down(MigrationBuilder migrationBuilder)
        {
            migrationBuilder.DropIndex(
                name: "IX_Trials_OpenFollowUps",
                table: "Trials");

            migrationBuilder.DropIndex(
                name: "IX_Clients_LastVisitDate_Code",
                table: "Clients");

            migrationBuilder.DropColumn(
                name: "LastVisitDate",
                table: "Clients");

            migrationBuilder.DropColumn(
                name: "SearchText",
                table: "Clients");
        }
    }
}
