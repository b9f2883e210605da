package org.lodestep.cli;

/** The safety cautions the rig commands print before they arm, energise or move anything. */
final class RigCautions {
    private RigCautions() {
    }

    static final String INSULATION = """
            CAUTION - insulation test: the rig applies %d V DC between the chosen lead and the motor frame.
              Disconnect the motor from its driver and from everything else first. Nobody touches the leads,
              the frame or the rig's test clips until the rig reports the reading (it discharges the winding
              before it answers). Test on an insulated bench, away from flammable vapour. Follow local
              electrical codes and your site's licensed practice; this tool does not replace them.""";

    static final String ENERGISED = """
            CAUTION - energised winding: the rig drives up to %.3g V through the winding between the chosen
              leads. Breaking that current can raise a high inductive voltage: keep hands off the leads while
              the test runs. Windings warm up on repeated tests. Follow local codes and licensed practice.""";

    static final String MOVING = """
            CAUTION - moving axis: the rig steps your driver up to %.0f full steps/s; the shaft and any load
              turn. Clear the travel, keep hands, hair and loose items away from belts, pulleys, screws and
              couplings, and keep an emergency stop within reach. A motor that loses steps can jerk or stall
              and restart. Motor and driver get hot: let them cool before handling. Follow your machine's
              safety rules, local codes and licensed practice.""";

    static final String CONFORMANCE = """
            CAUTION - conformance run: the checks apply the rig's lowest insulation test voltage (typically
              100 V DC) between lead 1 and the motor frame several times, a few seconds each, and run a slow
              sweep (10 to 20 full steps/s) that turns the shaft. Disconnect the motor from its driver, or better
              test with a dummy load of resistors on the rig's clips; nobody touches the leads, the frame or the
              clips while the checks run; clear the shaft's travel. Follow local electrical codes and your site's
              licensed practice; this tool does not replace them.""";

    static final String HAND_TURN = """
            Note - hand turn: spinning the shaft generates voltage at the leads; keep the leads apart and
              disconnected from any driver while you turn it.""";
}
