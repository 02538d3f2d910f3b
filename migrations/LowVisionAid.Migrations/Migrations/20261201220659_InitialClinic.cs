using System;
using Microsoft.EntityFrameworkCore.Migrations;

#nullable disable

namespace LowVisionAid.Migrations.Migrations
{
    /// <inheritdoc />
    public partial class InitialClinic : Migration
    {
        /// <inheritdoc />
        protected override void Up(MigrationBuilder migrationBuilder)
        {
            migrationBuilder.CreateTable(
                name: "Clients",
                columns: table => new
                {
                    Id = table.Column<int>(type: "INTEGER", nullable: false)
                        .Annotation("Sqlite:Autoincrement", true),
                    Code = table.Column<string>(type: "TEXT", maxLength: 40, nullable: false, collation: "NOCASE"),
                    Name = table.Column<string>(type: "TEXT", maxLength: 200, nullable: true),
                    YearOfBirth = table.Column<int>(type: "INTEGER", nullable: true),
                    Notes = table.Column<string>(type: "TEXT", maxLength: 4000, nullable: true),
                    IsDemo = table.Column<bool>(type: "INTEGER", nullable: false),
                    Version = table.Column<Guid>(type: "TEXT", nullable: false),
                    CreatedUtc = table.Column<DateTime>(type: "TEXT", nullable: false),
                    UpdatedUtc = table.Column<DateTime>(type: "TEXT", nullable: false)
                },
                constraints: table =>
                {
                    table.PrimaryKey("PK_Clients", x => x.Id);
                });

            migrationBuilder.CreateTable(
                name: "KitDevices",
                columns: table => new
                {
                    Id = table.Column<int>(type: "INTEGER", nullable: false)
                        .Annotation("Sqlite:Autoincrement", true),
                    Code = table.Column<string>(type: "TEXT", maxLength: 40, nullable: false, collation: "NOCASE"),
                    Name = table.Column<string>(type: "TEXT", maxLength: 200, nullable: false),
                    Kind = table.Column<string>(type: "TEXT", maxLength: 40, nullable: false),
                    Power = table.Column<double>(type: "REAL", nullable: true),
                    Aperture = table.Column<double>(type: "REAL", nullable: true),
                    MagnificationRange = table.Column<string>(type: "TEXT", maxLength: 60, nullable: true),
                    Illuminated = table.Column<bool>(type: "INTEGER", nullable: false),
                    InStock = table.Column<int>(type: "INTEGER", nullable: false),
                    Notes = table.Column<string>(type: "TEXT", maxLength: 4000, nullable: true),
                    IsDemo = table.Column<bool>(type: "INTEGER", nullable: false),
                    Version = table.Column<Guid>(type: "TEXT", nullable: false),
                    CreatedUtc = table.Column<DateTime>(type: "TEXT", nullable: false),
                    UpdatedUtc = table.Column<DateTime>(type: "TEXT", nullable: false)
                },
                constraints: table =>
                {
                    table.PrimaryKey("PK_KitDevices", x => x.Id);
                });

            migrationBuilder.CreateTable(
                name: "Settings",
                columns: table => new
                {
                    Id = table.Column<int>(type: "INTEGER", nullable: false),
                    ClinicName = table.Column<string>(type: "TEXT", maxLength: 200, nullable: false),
                    ClinicContact = table.Column<string>(type: "TEXT", maxLength: 4000, nullable: true),
                    Units = table.Column<string>(type: "TEXT", maxLength: 40, nullable: false),
                    SnellenIn = table.Column<string>(type: "TEXT", maxLength: 40, nullable: false),
                    SpotReserve = table.Column<double>(type: "REAL", nullable: false),
                    FluentReserve = table.Column<double>(type: "REAL", nullable: false),
                    SustainedReserve = table.Column<double>(type: "REAL", nullable: false),
                    CharacterPitch = table.Column<double>(type: "REAL", nullable: false),
                    HandoutPrintSize = table.Column<double>(type: "REAL", nullable: false),
                    HasDemoData = table.Column<bool>(type: "INTEGER", nullable: false),
                    Version = table.Column<Guid>(type: "TEXT", nullable: false),
                    CreatedUtc = table.Column<DateTime>(type: "TEXT", nullable: false),
                    UpdatedUtc = table.Column<DateTime>(type: "TEXT", nullable: false)
                },
                constraints: table =>
                {
                    table.PrimaryKey("PK_Settings", x => x.Id);
                });

            migrationBuilder.CreateTable(
                name: "Visits",
                columns: table => new
                {
                    Id = table.Column<int>(type: "INTEGER", nullable: false)
                        .Annotation("Sqlite:Autoincrement", true),
                    ClientId = table.Column<int>(type: "INTEGER", nullable: false),
                    VisitDate = table.Column<DateOnly>(type: "TEXT", nullable: false),
                    Practitioner = table.Column<string>(type: "TEXT", maxLength: 200, nullable: true),
                    DistanceRightText = table.Column<string>(type: "TEXT", maxLength: 60, nullable: true),
                    DistanceRight = table.Column<double>(type: "REAL", nullable: true),
                    DistanceLeftText = table.Column<string>(type: "TEXT", maxLength: 60, nullable: true),
                    DistanceLeft = table.Column<double>(type: "REAL", nullable: true),
                    DistanceBothText = table.Column<string>(type: "TEXT", maxLength: 60, nullable: true),
                    DistanceBoth = table.Column<double>(type: "REAL", nullable: true),
                    NearThresholdText = table.Column<string>(type: "TEXT", maxLength: 60, nullable: true),
                    NearThreshold = table.Column<double>(type: "REAL", nullable: true),
                    NearTestDistanceText = table.Column<string>(type: "TEXT", maxLength: 60, nullable: true),
                    NearTestDistance = table.Column<double>(type: "REAL", nullable: true),
                    ContrastSensitivityText = table.Column<string>(type: "TEXT", maxLength: 60, nullable: true),
                    ContrastLogCs = table.Column<double>(type: "REAL", nullable: true),
                    RefractionWorn = table.Column<string>(type: "TEXT", maxLength: 200, nullable: true),
                    AddWornText = table.Column<string>(type: "TEXT", maxLength: 60, nullable: true),
                    AddWorn = table.Column<double>(type: "REAL", nullable: true),
                    AccommodationText = table.Column<string>(type: "TEXT", maxLength: 60, nullable: true),
                    AccommodationMeasured = table.Column<double>(type: "REAL", nullable: true),
                    WorkingDistanceText = table.Column<string>(type: "TEXT", maxLength: 60, nullable: true),
                    WorkingDistance = table.Column<double>(type: "REAL", nullable: true),
                    NeedsHandsFree = table.Column<bool>(type: "INTEGER", nullable: false),
                    HasTremor = table.Column<bool>(type: "INTEGER", nullable: false),
                    UsefulEyes = table.Column<string>(type: "TEXT", maxLength: 40, nullable: false),
                    HomeLighting = table.Column<string>(type: "TEXT", maxLength: 40, nullable: false),
                    Notes = table.Column<string>(type: "TEXT", maxLength: 4000, nullable: true),
                    Version = table.Column<Guid>(type: "TEXT", nullable: false),
                    CreatedUtc = table.Column<DateTime>(type: "TEXT", nullable: false),
                    UpdatedUtc = table.Column<DateTime>(type: "TEXT", nullable: false)
                },
                constraints: table =>
                {
                    table.PrimaryKey("PK_Visits", x => x.Id);
                    table.ForeignKey(
                        name: "FK_Visits_Clients_ClientId",
                        column: x => x.ClientId,
                        principalTable: "Clients",
                        principalColumn: "Id",
                        onDelete: ReferentialAction.Cascade);
                });

            migrationBuilder.CreateTable(
                name: "Plans",
                columns: table => new
                {
                    Id = table.Column<int>(type: "INTEGER", nullable: false)
                        .Annotation("Sqlite:Autoincrement", true),
                    VisitId = table.Column<int>(type: "INTEGER", nullable: false),
                    CreatedUtc = table.Column<DateTime>(type: "TEXT", nullable: false),
                    MethodVersion = table.Column<string>(type: "TEXT", maxLength: 40, nullable: false),
                    InputsJson = table.Column<string>(type: "TEXT", nullable: false),
                    OutputsJson = table.Column<string>(type: "TEXT", nullable: false)
                },
                constraints: table =>
                {
                    table.PrimaryKey("PK_Plans", x => x.Id);
                    table.ForeignKey(
                        name: "FK_Plans_Visits_VisitId",
                        column: x => x.VisitId,
                        principalTable: "Visits",
                        principalColumn: "Id",
                        onDelete: ReferentialAction.Cascade);
                });

            migrationBuilder.CreateTable(
                name: "ReadingSpeeds",
                columns: table => new
                {
                    Id = table.Column<int>(type: "INTEGER", nullable: false)
                        .Annotation("Sqlite:Autoincrement", true),
                    VisitId = table.Column<int>(type: "INTEGER", nullable: false),
                    Position = table.Column<int>(type: "INTEGER", nullable: false),
                    PrintSizeText = table.Column<string>(type: "TEXT", maxLength: 60, nullable: false),
                    PrintSize = table.Column<double>(type: "REAL", nullable: false),
                    WordsPerMinute = table.Column<int>(type: "INTEGER", nullable: false)
                },
                constraints: table =>
                {
                    table.PrimaryKey("PK_ReadingSpeeds", x => x.Id);
                    table.ForeignKey(
                        name: "FK_ReadingSpeeds_Visits_VisitId",
                        column: x => x.VisitId,
                        principalTable: "Visits",
                        principalColumn: "Id",
                        onDelete: ReferentialAction.Cascade);
                });

            migrationBuilder.CreateTable(
                name: "VisitGoals",
                columns: table => new
                {
                    Id = table.Column<int>(type: "INTEGER", nullable: false)
                        .Annotation("Sqlite:Autoincrement", true),
                    VisitId = table.Column<int>(type: "INTEGER", nullable: false),
                    Position = table.Column<int>(type: "INTEGER", nullable: false),
                    Task = table.Column<string>(type: "TEXT", maxLength: 40, nullable: false),
                    Detail = table.Column<string>(type: "TEXT", maxLength: 200, nullable: true),
                    TargetPrintText = table.Column<string>(type: "TEXT", maxLength: 60, nullable: false),
                    TargetPrint = table.Column<double>(type: "REAL", nullable: false)
                },
                constraints: table =>
                {
                    table.PrimaryKey("PK_VisitGoals", x => x.Id);
                    table.ForeignKey(
                        name: "FK_VisitGoals_Visits_VisitId",
                        column: x => x.VisitId,
                        principalTable: "Visits",
                        principalColumn: "Id",
                        onDelete: ReferentialAction.Cascade);
                });

            migrationBuilder.CreateTable(
                name: "Trials",
                columns: table => new
                {
                    Id = table.Column<int>(type: "INTEGER", nullable: false)
                        .Annotation("Sqlite:Autoincrement", true),
                    PlanId = table.Column<int>(type: "INTEGER", nullable: false),
                    TrialDate = table.Column<DateOnly>(type: "TEXT", nullable: false),
                    KitDeviceId = table.Column<int>(type: "INTEGER", nullable: true),
                    DeviceDescription = table.Column<string>(type: "TEXT", maxLength: 200, nullable: false),
                    Task = table.Column<string>(type: "TEXT", maxLength: 40, nullable: true),
                    ResultText = table.Column<string>(type: "TEXT", maxLength: 60, nullable: true),
                    ResultWordsPerMinute = table.Column<int>(type: "INTEGER", nullable: true),
                    ClientComment = table.Column<string>(type: "TEXT", maxLength: 4000, nullable: true),
                    Outcome = table.Column<string>(type: "TEXT", maxLength: 40, nullable: false),
                    FollowUpDue = table.Column<DateOnly>(type: "TEXT", nullable: true),
                    FollowUpDone = table.Column<DateOnly>(type: "TEXT", nullable: true),
                    Version = table.Column<Guid>(type: "TEXT", nullable: false),
                    CreatedUtc = table.Column<DateTime>(type: "TEXT", nullable: false),
                    UpdatedUtc = table.Column<DateTime>(type: "TEXT", nullable: false)
                },
                constraints: table =>
                {
                    table.PrimaryKey("PK_Trials", x => x.Id);
                    table.ForeignKey(
                        name: "FK_Trials_KitDevices_KitDeviceId",
                        column: x => x.KitDeviceId,
                        principalTable: "KitDevices",
                        principalColumn: "Id",
                        onDelete: ReferentialAction.SetNull);
                    table.ForeignKey(
                        name: "FK_Trials_Plans_PlanId",
                        column: x => x.PlanId,
                        principalTable: "Plans",
                        principalColumn: "Id",
                        onDelete: ReferentialAction.Cascade);
                });

            migrationBuilder.CreateIndex(
                name: "IX_Clients_Code",
                table: "Clients",
                column: "Code",
                unique: true);

            migrationBuilder.CreateIndex(
                name: "IX_Clients_Name",
                table: "Clients",
                column: "Name");

            migrationBuilder.CreateIndex(
                name: "IX_KitDevices_Code",
                table: "KitDevices",
                column: "Code",
                unique: true);

            migrationBuilder.CreateIndex(
                name: "IX_Plans_VisitId",
                table: "Plans",
                column: "VisitId");

            migrationBuilder.CreateIndex(
                name: "IX_ReadingSpeeds_VisitId",
                table: "ReadingSpeeds",
                column: "VisitId");

            migrationBuilder.CreateIndex(
                name: "IX_Trials_FollowUpDue",
                table: "Trials",
                column: "FollowUpDue");

            migrationBuilder.CreateIndex(
                name: "IX_Trials_KitDeviceId",
                table: "Trials",
                column: "KitDeviceId");

            migrationBuilder.CreateIndex(
                name: "IX_Trials_PlanId",
                table: "Trials",
                column: "PlanId");

            migrationBuilder.CreateIndex(
                name: "IX_VisitGoals_VisitId",
                table: "VisitGoals",
                column: "VisitId");

            migrationBuilder.CreateIndex(
                name: "IX_Visits_ClientId_VisitDate",
                table: "Visits",
                columns: new[] { "ClientId", "VisitDate" });
        }

        /// <inheritdoc />
        protected override void Down(MigrationBuilder migrationBuilder)
        {
            migrationBuilder.DropTable(
                name: "ReadingSpeeds");

            migrationBuilder.DropTable(
                name: "Settings");

            migrationBuilder.DropTable(
                name: "Trials");

            migrationBuilder.DropTable(
                name: "VisitGoals");

            migrationBuilder.DropTable(
                name: "KitDevices");

            migrationBuilder.DropTable(
                name: "Plans");

            migrationBuilder.DropTable(
                name: "Visits");

            migrationBuilder.DropTable(
                name: "Clients");
        }
    }
}
