using Microsoft.EntityFrameworkCore.Migrations;

#nullable disable

namespace LowVisionAid.Migrations.Migrations
{
    /// <inheritdoc />
    public partial class ClinicCostClasses : Migration
    {
        /// <inheritdoc />
        protected override void Up(MigrationBuilder migrationBuilder)
        {
            migrationBuilder.AddColumn<string>(
                name: "CostClasses",
                table: "Settings",
                type: "TEXT",
                maxLength: 4000,
                nullable: false,
                defaultValue: "");
        }

        /// <inheritdoc />
        protected override void Down(MigrationBuilder migrationBuilder)
        {
            migrationBuilder.DropColumn(
                name: "CostClasses",
                table: "Settings");
        }
    }
}
