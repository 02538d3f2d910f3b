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
                name: "IX_Clients_LastVisitDate_Code_SearchText",
                table: "Clients",
                columns: new[] { "LastVisitDate", "Code", "SearchText" },
                descending: new[] { true, false, false });

            // The latest visit of every client already recorded; the search text is filled by ClientSearch.FillMissingAsync.
            migrationBuilder.Sql("UPDATE Clients SET LastVisitDate = (SELECT MAX(v.VisitDate) FROM Visits AS v WHERE v.ClientId = Clients.Id);");

            // A trigram full-text index over the search text (SQLite FTS5, external content), kept by triggers, so a search
            // for any part of a code or name of three or more letters reads the matching clients only (ClientSearch).
            migrationBuilder.Sql("CREATE VIRTUAL TABLE ClientSearchIndex USING fts5(SearchText, content='Clients', content_rowid='Id', tokenize='trigram');");
            migrationBuilder.Sql("CREATE TRIGGER Clients_SearchIndex_Insert AFTER INSERT ON Clients BEGIN INSERT INTO ClientSearchIndex(rowid, SearchText) VALUES (new.Id, new.SearchText); END;");
            migrationBuilder.Sql("CREATE TRIGGER Clients_SearchIndex_Delete AFTER DELETE ON Clients BEGIN INSERT INTO ClientSearchIndex(ClientSearchIndex, rowid, SearchText) VALUES ('delete', old.Id, old.SearchText); END;");
            migrationBuilder.Sql("CREATE TRIGGER Clients_SearchIndex_Update AFTER UPDATE OF SearchText ON Clients BEGIN INSERT INTO ClientSearchIndex(ClientSearchIndex, rowid, SearchText) VALUES ('delete', old.Id, old.SearchText); INSERT INTO ClientSearchIndex(rowid, SearchText) VALUES (new.Id, new.SearchText); END;");
            migrationBuilder.Sql("INSERT INTO ClientSearchIndex(ClientSearchIndex) VALUES ('rebuild');");
        }

        /// <inheritdoc />
        protected override void Down(MigrationBuilder migrationBuilder)
        {
            migrationBuilder.Sql("DROP TRIGGER Clients_SearchIndex_Update;");
            migrationBuilder.Sql("DROP TRIGGER Clients_SearchIndex_Delete;");
            migrationBuilder.Sql("DROP TRIGGER Clients_SearchIndex_Insert;");
            migrationBuilder.Sql("DROP TABLE ClientSearchIndex;");

            migrationBuilder.DropIndex(
                name: "IX_Trials_OpenFollowUps",
                table: "Trials");

            migrationBuilder.DropIndex(
                name: "IX_Clients_LastVisitDate_Code_SearchText",
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
