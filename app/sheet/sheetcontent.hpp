#pragma once
// What a hazard sheet shows: one laser's assessment with its lab, the shelf it was checked against, the stored
// assessments and their sign-offs, and the words every sheet carries (version, rule sets, caution).
#include "beamwarden/assessment/assessment.hpp"
#include "beamwarden/error.hpp"
#include "beamwarden/model/records.hpp"

#include <QPageLayout>
#include <QString>
#include <QStringList>

#include <optional>
#include <string_view>
#include <vector>

namespace beamwarden::sheet {

enum class PageSize : std::uint8_t { A4, Letter };

// "a4" or "letter" (any case); std::nullopt for anything else.
[[nodiscard]] std::optional<PageSize> parsePageSize(std::string_view text);
// The paper, portrait, without margins: the sheet draws its own margins and fits any printer's printable area.
[[nodiscard]] QPageLayout pageLayout(PageSize size);

struct SheetContent {
    model::Lab lab;
    assessment::LaserAssessment assessment; // the laser itself is assessment.laser
    std::vector<model::EyewearItem> shelf;  // the items assessment.eyewear was checked from, same order (for the plot)
    std::vector<model::Assessment> records; // the laser's stored assessments, oldest first; may be empty
    QString programVersion;                 // beamwarden::programVersion()
    QStringList ruleSetNames;               // limits::fullName of every set behind the figures
    QString caution;                        // beamwarden::caution(), translated
    PageSize pageSize = PageSize::A4;
    QString language; // "en", "de", ...: numbers are written the way this language does
};

// Fills the program version, the rule-set names for the assessment's options and the caution (translated through
// the installed translators, as the GUI's caution strip does).
[[nodiscard]] SheetContent makeSheetContent(model::Lab lab, assessment::LaserAssessment assessment,
                                            std::vector<model::EyewearItem> shelf,
                                            std::vector<model::Assessment> records, PageSize pageSize = PageSize::A4,
                                            QString language = {});

// Assesses `laser` against `shelf` and wraps it with makeSheetContent; refuses what assessment::assessLaser refuses.
[[nodiscard]] Result<SheetContent> buildSheetContent(const model::Lab& lab, const model::Laser& laser,
                                                     const std::vector<model::EyewearItem>& shelf,
                                                     std::vector<model::Assessment> records,
                                                     const assessment::AssessmentOptions& options = {},
                                                     PageSize pageSize = PageSize::A4, QString language = {});

// The translated caution (context "Caution", the same entry the GUI uses).
[[nodiscard]] QString translatedCaution();

} // namespace beamwarden::sheet
