#include "panels/panel.hpp"

#include <QCoreApplication>

namespace beamwarden::gui {

QString panelTitle(Panel panel)
{
    switch (panel) {
    case Panel::Lasers:
        return QCoreApplication::translate("Panel", "Lasers");
    case Panel::Eyewear:
        return QCoreApplication::translate("Panel", "Eyewear");
    case Panel::Assessment:
        return QCoreApplication::translate("Panel", "Assessment");
    case Panel::LimitCurves:
        return QCoreApplication::translate("Panel", "Limit curves");
    case Panel::HazardSheet:
        return QCoreApplication::translate("Panel", "Hazard sheet");
    case Panel::History:
        return QCoreApplication::translate("Panel", "History");
    case Panel::Count:
        break;
    }
    return {};
}

QString panelPurpose(Panel panel)
{
    switch (panel) {
    case Panel::Lasers:
        return QCoreApplication::translate("Panel", "The lab's lasers and their outputs: emission, beam and the ways a "
                                                    "person could be exposed.");
    case Panel::Eyewear:
        return QCoreApplication::translate("Panel", "The eyewear shelf: each item's spectral optical density and its "
                                                    "EN 207 / EN 208 markings.");
    case Panel::Assessment:
        return QCoreApplication::translate("Panel", "Live results for the selected laser: exposure limits, hazard "
                                                    "distances, required optical density and the eyewear that "
                                                    "covers it.");
    case Panel::LimitCurves:
        return QCoreApplication::translate("Panel", "MPE against exposure duration, required and available optical "
                                                    "density against wavelength, exposure against distance.");
    case Panel::HazardSheet:
        return QCoreApplication::translate("Panel", "The one-page summary of a laser's assessment, to print or export "
                                                    "as PDF.");
    case Panel::History:
        return QCoreApplication::translate("Panel", "Dated assessments and their sign-offs.");
    case Panel::Count:
        break;
    }
    return {};
}

} // namespace beamwarden::gui
