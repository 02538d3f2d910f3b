using Microsoft.EntityFrameworkCore.Migrations;

#nullable disable

namespace LowVisionAid.Migrations.Migrations
{
    /// <inheritdoc />
    public partial class KitOpticsAndDistanceGoals : Migration
    {
        /// <inheritdoc />
        protected override void Up(MigrationBuilder migrationBuilder)
        {
            migrationBuilder.DropColumn(
                name: "MagnificationRange",
                table: "KitDevices");

            migrationBuilder.RenameColumn(
                name: "TargetPrintText",
                table: "VisitGoals",
                newName: "TargetText");

            migrationBuilder.AlterColumn<double>(
                name: "TargetPrint",
                table: "VisitGoals",
                type: "REAL",
                nullable: true,
                oldClrType: typeof(double),
                oldType: "REAL");

            migrationBuilder.AddColumn<double>(
                name: "TargetAcuity",
                table: "VisitGoals",
                type: "REAL",
                nullable: true);

            migrationBuilder.AddColumn<double>(
                name: "EnlargementRatio",
                table: "KitDevices",
                type: "REAL",
                nullable: true);

            migrationBuilder.AddColumn<double>(
                name: "Field",
                table: "KitDevices",
                type: "REAL",
                nullable: true);

            migrationBuilder.AddColumn<double>(
                name: "FocusNearest",
                table: "KitDevices",
                type: "REAL",
                nullable: true);

            migrationBuilder.AddColumn<double>(
                name: "ImageBelowLens",
                table: "KitDevices",
                type: "REAL",
                nullable: true);

            migrationBuilder.AddColumn<string>(
                name: "LabelConvention",
                table: "KitDevices",
                type: "TEXT",
                maxLength: 40,
                nullable: true);

            migrationBuilder.AddColumn<double>(
                name: "LabelTimes",
                table: "KitDevices",
                type: "REAL",
                nullable: true);

            migrationBuilder.AddColumn<double>(
                name: "Magnification",
                table: "KitDevices",
                type: "REAL",
                nullable: true);

            migrationBuilder.AddColumn<double>(
                name: "ReadingCap",
                table: "KitDevices",
                type: "REAL",
                nullable: true);

            migrationBuilder.AddColumn<double>(
                name: "StandHeight",
                table: "KitDevices",
                type: "REAL",
                nullable: true);
        }

        /// <inheritdoc />
        protected override void Down(MigrationBuilder migrationBuilder)
        {
            migrationBuilder.DropColumn(
                name: "TargetAcuity",
                table: "VisitGoals");

            migrationBuilder.DropColumn(
                name: "EnlargementRatio",
                table: "KitDevices");

            migrationBuilder.DropColumn(
                name: "Field",
                table: "KitDevices");

            migrationBuilder.DropColumn(
                name: "FocusNearest",
                table: "KitDevices");

            migrationBuilder.DropColumn(
                name: "ImageBelowLens",
                table: "KitDevices");

            migrationBuilder.DropColumn(
                name: "LabelConvention",
                table: "KitDevices");

            migrationBuilder.DropColumn(
                name: "LabelTimes",
                table: "KitDevices");

            migrationBuilder.DropColumn(
                name: "Magnification",
                table: "KitDevices");

            migrationBuilder.DropColumn(
                name: "ReadingCap",
                table: "KitDevices");

            migrationBuilder.DropColumn(
                name: "StandHeight",
                table: "KitDevices");

            migrationBuilder.RenameColumn(
                name: "TargetText",
                table: "VisitGoals",
                newName: "TargetPrintText");

            migrationBuilder.AlterColumn<double>(
                name: "TargetPrint",
                table: "VisitGoals",
                type: "REAL",
                nullable: false,
                defaultValue: 0.0,
                oldClrType: typeof(double),
                oldType: "REAL",
                oldNullable: true);

            migrationBuilder.AddColumn<string>(
                name: "MagnificationRange",
                table: "KitDevices",
                type: "TEXT",
                maxLength: 60,
                nullable: true);
        }
    }
}
