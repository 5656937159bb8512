package org.resonancegate.dynamics;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.resonancegate.fixtures.Specs.AT;
import static org.resonancegate.fixtures.Specs.kg;
import static org.resonancegate.fixtures.Specs.mmPerS;
import static org.resonancegate.fixtures.Specs.order;
import static org.resonancegate.fixtures.Specs.range;

import org.apache.commons.math3.complex.Complex;
import org.junit.jupiter.api.Test;
import org.resonancegate.spec.Excitation;
import org.resonancegate.spec.UnbalanceAmount;

/** Excitations turned into loads: balance grades (ISO 21940-11) and base-motion measures (check-values 3.9). */
class DrivesTest {

    // check-values.md 4.4 (read: tooling catalogue worked example of ISO 21940-11):
    // M = 2 kg, G 6.3, 10 000 r/min → U_per ≈ 12 g·mm; by the formula 9549·G·M/n = 12.03 g·mm.
    @Test
    void balanceGradeWorkedExample() {
        Excitation.Unbalance u = new Excitation.Unbalance("rotor", 0, order(1),
                new UnbalanceAmount.FromBalanceGrade(6.3, "G 6.3", AT, kg(2)), AT);
        double uKgM = Drives.unbalance(u, range(5000, 10000));
        assertEquals(12.03, uKgM * 1e6, 0.005);
        assertEquals(9549.3 * 6.3 * 2 / 10000, uKgM * 1e6, 1e-3);
    }

    // Ω_max = order × top of the speed range; U does not change with speed, so F = U·ω².
    @Test
    void balanceGradeUsesTheRotorsOwnTopSpeedAndAFixedUnbalance() {
        Excitation.Unbalance u = new Excitation.Unbalance("gearbox rotor", 0, order(2),
                new UnbalanceAmount.FromBalanceGrade(2.5, "G 2.5", AT, kg(40)), AT);
        double omegaMax = 2 * 1500 * 2 * Math.PI / 60;
        assertEquals(40 * 0.0025 / omegaMax, Drives.unbalance(u, range(900, 1500)), 1e-15);
        double speed = 1000 * 2 * Math.PI / 60;
        Drive d = Drives.at(u, speed, range(900, 1500)).orElseThrow();
        assertEquals(2 * speed, d.omega(), 1e-12);
        assertEquals(40 * 0.0025 / omegaMax * Math.pow(2 * speed, 2), d.load().amplitude().abs(), 1e-9);
    }

    // check-values.md 3.9 (read: conversion notes): V = ωX, A = ω²X; each integration shifts
    // the phase by 90°.
    @Test
    void baseMotionMeasures() {
        double omega = 30;
        Excitation.BaseMotion v = new Excitation.BaseMotion("floor", 0, order(1),
                Excitation.MotionMeasure.VELOCITY, mmPerS(3), AT);
        Complex yv = Drives.groundDisplacement(v, omega);
        assertEquals(0.003 / omega, yv.abs(), 1e-15);
        assertEquals(-Math.PI / 2, yv.getArgument(), 1e-12);
        Excitation.BaseMotion a = new Excitation.BaseMotion("floor", 0, order(1),
                Excitation.MotionMeasure.ACCELERATION, org.resonancegate.fixtures.Specs.metresPerS2(0.2), AT);
        Complex ya = Drives.groundDisplacement(a, omega);
        assertEquals(0.2 / (omega * omega), ya.abs(), 1e-15);
        assertEquals(Math.PI, Math.abs(ya.getArgument()), 1e-12);
    }
}
