using Microsoft.EntityFrameworkCore.Migrations;

#nullable disable

namespace LowVisionAid.Migrations.Migrations
{
    /// <inheritdoc />
    public partial class GoalViewingDistance : Migration
    {
        /// <inheritdoc />
        protected override void Up(MigrationBuilder migrationBuilder)
        {
            migrationBuilder.AddColumn<double>(
                name: "ViewingDistance",
                table: "VisitGoals",
                type: "REAL",
                nullable: true);

            migrationBuilder.AddColumn<string>(
                name: "ViewingDistanceText",
                table: "VisitGoals",
                type: "TEXT",
                maxLength: 60,
                nullable: true);
        }

        /// <inheritdoc />
        protected override void Down(MigrationBuilder migrationBuilder)
        {
            migrationBuilder.DropColumn(
                name: "ViewingDistance",
                table: "VisitGoals");

            migrationBuilder.DropColumn(
                name: "ViewingDistanceText",
                table: "VisitGoals");
        }
    }
}
